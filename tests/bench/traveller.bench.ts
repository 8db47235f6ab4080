// Run traveller PDFs: one lot (goal < 150 ms) and a batch of 100 lots in one PDF (goal < 10 s).
import { renderTraveller, renderTravellerBatch } from '../../server/services/traveller/render-traveller';
import { demoDraft, demoLongTraveller, demoTraveller } from '../server/services/traveller/traveller-fixtures';
import { medianMs, report } from './measure';

export default async function travellerBench(): Promise<void> {
  const released = demoTraveller();
  const draft = demoDraft();

  report('render one traveller (3 steps, released)', await medianMs(() => renderTraveller(released), 30, 5), 150);
  report('render one traveller (3 steps, not released, marked)', await medianMs(() => renderTraveller(draft), 30, 3), 150);
  const long = demoLongTraveller(30);
  report('render one traveller (30 steps, 4 pages)', await medianMs(() => renderTraveller(long), 15, 2), 150);

  const lots = Array.from({ length: 100 }, (_, i) =>
    demoTraveller({ lot: { ...released.lot!, lotId: `L25-${String(1000 + i)}` } }),
  );
  report('render a batch of 100 travellers into one PDF', await medianMs(() => renderTravellerBatch(lots), 3, 1), 10_000);
}
