import { beforeAll, describe, expect, it } from 'vitest';
import { renderTraveller, renderTravellerBatch } from '../../../../server/services/traveller/render-traveller';
import { SAFETY_DEFERRAL } from '../../../../server/services/traveller/safety';
import { compact, flat, pdfFonts, pdfPageCount, pdfText, pdfWordBoxes } from './pdf-tools';
import { demoDraft, demoLongTraveller, demoTraveller, gasSteps } from './traveller-fixtures';

const MARK = compact('NOT RELEASED — DO NOT RUN');
const pagesOf = (pdf: Buffer) => Array.from({ length: pdfPageCount(pdf) }, (_, i) => pdfText(pdf, i + 1));

describe('renderTraveller, released version', () => {
  let pdf: Buffer;
  let text: string;
  beforeAll(async () => {
    pdf = await renderTraveller(demoTraveller());
    text = flat(pdfText(pdf));
  });

  it('is a PDF', () => {
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
  });

  it.each([
    ['the product', 'TUBEWRIGHT'],
    ['the recipe and its code', 'NPN emitter, 0.8 µm (EMT-08)'],
    ['the version and its state', 'v3 · released'],
    ['the parameter set', 'Handbook Arrhenius set 2024-1'],
    ['the engine version', 'engine 0.4.2'],
    ['the signature', 'R. Okafor (lead) · 2025-03-14 09:42'],
    ['the meaning of the signature', 'Approved for pilot-line runs'],
    ['the lot', 'L25-0412'],
    ['who printed it and when', 'J. Marsh (operator) · 2025-03-17 08:02'],
    ['a setpoint with its unit', '1050 °C'],
    ['a ramp', '8 °C/min from 750 °C'],
    ['an ambient', 'N2 + 5 % O2'],
  ])('prints %s', (_what, expected) => {
    expect(text).toContain(expected);
  });

  it.each([
    ['Junction depth after step 2', '0.812', 'µm', '± 10 %'],
    ['Sheet resistance after step 2', '18.6', 'ohm/sq', '± 8 %'],
    ['Surface concentration', '3.41e20', 'cm-3', '± 25 %'],
    ['Oxide thickness after step 3', '412', 'nm', '± 5 %'],
  ])('prints the target %s as %s %s within %s', (label, predicted, unit, window) => {
    expect(text).toContain(`${label} ${predicted} ${unit} ${window}`);
  });

  it('leaves write-in boxes for initials, start and end of each step and the measured values', () => {
    expect(text.match(/initials start end/g)).toHaveLength(3);
    expect(text).toContain('MEASURED');
    expect(text).toContain('Notes and deviations');
  });

  it('prints the cautions the steps call for and ends the safety block with the deferral', () => {
    expect(text).toContain('Phosphorus oxychloride (POCl3) liquid source');
    expect(text).toContain('Hydrofluoric acid (HF)');
    expect(text).toContain('Hydrogen and pyrogenic steam');
    expect(text).toContain('Hot furnace and quartzware');
    expect(text).not.toContain('Arsine (AsH3)');
    const withoutFooters = text.replace(/Tubewright run traveller · .*? page \d+ of \d+/g, '').trimEnd();
    expect(withoutFooters.endsWith(SAFETY_DEFERRAL)).toBe(true);
  });

  it('numbers every page "page N of M"', () => {
    const pages = pagesOf(pdf);
    expect(pages.length).toBeGreaterThan(1);
    pages.forEach((page, i) => expect(page).toContain(`page ${i + 1} of ${pages.length}`));
  });

  it('carries no not-released mark on any page', () => {
    for (const page of pagesOf(pdf)) expect(compact(page)).not.toContain(MARK);
    expect(text).not.toContain('NOT RELEASED');
  });

  it('embeds IBM Plex Mono for the data', () => {
    const plex = pdfFonts(pdf).filter((f) => f.name.includes('IBMPlexMono'));
    expect(plex.map((f) => f.name.split('+')[1]).sort()).toEqual(['IBMPlexMono-Regular', 'IBMPlexMono-SemiBold']);
    expect(plex.every((f) => f.embedded)).toBe(true);
  });
});

describe('renderTraveller, unreleased versions', () => {
  it.each(['draft', 'in_review', 'retired'] as const)('marks every page of a %s version NOT RELEASED — DO NOT RUN', async (state) => {
    const draft = demoDraft();
    const pdf = await renderTraveller({ ...draft, recipe: { ...draft.recipe, state } });
    const pages = pagesOf(pdf);
    for (const page of pages) expect(compact(page)).toContain(MARK);
  });

  it('says the version is not signed', async () => {
    const text = flat(pdfText(await renderTraveller(demoDraft())));
    expect(text).toContain('Signed not signed');
    expect(text).toContain('v4 · draft');
  });
});

describe('renderTraveller, hazardous sources', () => {
  let text: string;
  beforeAll(async () => {
    text = flat(pdfText(await renderTraveller(demoTraveller({ steps: gasSteps }))));
  });

  it.each([
    ['arsine', 'Arsine (AsH3)'],
    ['phosphine', 'Phosphine (PH3)'],
    ['diborane', 'Diborane (B2H6)'],
    ['BBr3', 'Boron tribromide (BBr3) liquid source'],
    ['HF deglaze', 'Hydrofluoric acid (HF)'],
    ['hot furnace', 'Hot furnace and quartzware'],
    ['implanter', 'Ion implanter'],
  ])('prints the %s caution', (_what, title) => {
    expect(text).toContain(title);
  });

  it('prints the deferral sentence', () => {
    expect(text).toContain(SAFETY_DEFERRAL);
  });

  it('prints the deferral even for a recipe with no steps', async () => {
    const empty = flat(pdfText(await renderTraveller(demoTraveller({ steps: [], targets: [] }))));
    expect(empty).toContain(SAFETY_DEFERRAL);
    expect(empty).toContain('This version has no predicted targets.');
  });
});

describe('renderTraveller, 30 steps', () => {
  let pdf: Buffer;
  let pages: string[];
  beforeAll(async () => {
    pdf = await renderTraveller(demoLongTraveller(30));
    pages = pagesOf(pdf);
  });

  it('keeps every word inside the 40 pt side margins and above the page bottom (A4, 595 × 842 pt)', () => {
    const boxes = pdfWordBoxes(pdf);
    expect(boxes.length).toBeGreaterThan(500);
    for (const b of boxes) {
      expect(b.xMin, b.word).toBeGreaterThanOrEqual(39.5);
      expect(b.xMax, b.word).toBeLessThanOrEqual(595.28 - 39.5);
      expect(b.yMax, b.word).toBeLessThanOrEqual(841.89 - 15);
    }
  });

  it('runs over several pages, each numbered', () => {
    expect(pages.length).toBeGreaterThanOrEqual(3);
    pages.forEach((page, i) => expect(page).toContain(`page ${i + 1} of ${pages.length}`));
  });

  it('repeats the table header on every page the steps continue onto', () => {
    const stepPages = pages.filter((p) => /\(\d+\)/.test(p));
    expect(stepPages.length).toBeGreaterThanOrEqual(2);
    for (const page of stepPages) expect(page).toContain('SETPOINTS AND RAMPS');
    for (const page of stepPages.slice(1)) expect(flat(page)).toContain('Steps continued');
  });

  it('prints every step once, in order, and never splits a step from its record boxes', () => {
    const seen: number[] = [];
    for (const page of pages) {
      const labels = [...flat(page).matchAll(/\((\d+)\) /g)].map((m) => Number(m[1]));
      seen.push(...labels);
      // A whole row on one page: as many sets of record boxes as step labels.
      expect(flat(page).match(/initials start end/g)?.length ?? 0).toBe(labels.length);
    }
    expect(seen).toEqual(Array.from({ length: 30 }, (_, i) => i + 1));
  });
});

describe('renderTravellerBatch', () => {
  it('puts many lots in one PDF, numbers pages per lot and marks only the unreleased one', async () => {
    const released = demoTraveller();
    const draft = demoDraft();
    const other = demoTraveller({ lot: { ...released.lot!, lotId: 'L25-0413' } });
    const progress: Array<[number, number]> = [];
    const pdf = await renderTravellerBatch([released, draft, other], (done, total) => progress.push([done, total]));

    expect(progress).toEqual([[1, 3], [2, 3], [3, 3]]);
    const single = pdfPageCount(await renderTraveller(released));
    const pages = pagesOf(pdf);
    expect(pages).toHaveLength(3 * single);
    pages.forEach((page, i) => {
      expect(page).toContain(`page ${(i % single) + 1} of ${single}`);
      expect(compact(page).includes(MARK)).toBe(Math.floor(i / single) === 1);
    });
    expect(pages[2 * single]).toContain('L25-0413');
  });

  it('gives the event loop a turn between travellers, so progress can be streamed', async () => {
    const events: string[] = [];
    const timer = setInterval(() => events.push('tick'), 0);
    await renderTravellerBatch([demoTraveller(), demoTraveller(), demoTraveller()], (done) => events.push(`done ${done}`));
    clearInterval(timer);
    const first = events.indexOf('done 1');
    const last = events.indexOf('done 3');
    expect(events.slice(first, last)).toContain('tick');
  });

  it('refuses an empty batch', async () => {
    await expect(renderTravellerBatch([])).rejects.toThrow(/at least one/);
  });
});
