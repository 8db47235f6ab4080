import { idParam } from '../../shared/schemas/api';
import { batchTravellersSchema, createLotSchema, listLotsQuerySchema, patchLotSchema } from '../../shared/schemas/lots';
import type { Db } from '../db/index';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { createLot, getLot, listLots, patchLot } from '../services/lots.service';
import { printLotBatch, printLotTraveller } from '../services/traveller/print.service';
import { defineRoutes } from './define-routes';

export function lotsRoutes(db: Db) {
  const r = defineRoutes('/api/lots');

  r.get('/', 'signed-in', async (req, res) => {
    res.json({ data: await listLots(db, parseQuery(listLotsQuerySchema, req)) });
  });

  r.post('/', ['operator', 'engineer'], async (req, res) => {
    const input = parseBody(createLotSchema, req);
    res.status(201).json({ data: await createLot(db, req.user!, input) });
  });

  /**
   * Many travellers in one PDF. The answer is NDJSON: one `{"progress":{done,total}}`
   * line per lot laid out, then `{"pdf":"<base64>"}` (or `{"error":…}`), so the
   * client shows a progress bar without any job state on the server.
   */
  r.post('/travellers', 'signed-in', async (req, res) => {
    const { lotIds } = parseBody(batchTravellersSchema, req);
    for (const id of lotIds) await getLot(db, id); // 404 before the stream starts
    res.type('application/x-ndjson');
    res.setHeader('Cache-Control', 'no-store');
    const line = (obj: unknown) => res.write(`${JSON.stringify(obj)}\n`);
    line({ progress: { done: 0, total: lotIds.length } });
    try {
      const pdf = await printLotBatch(db, req.user!, lotIds, (done, total) => line({ progress: { done, total } }));
      line({ pdf: pdf.toString('base64'), fileName: `travellers-${lotIds.length}-lots.pdf` });
    } catch (e) {
      console.error(e);
      line({ error: { code: 'internal', message: 'Printing failed; nothing was printed' } });
    }
    res.end();
  });

  r.get('/:id', 'signed-in', async (req, res) => {
    const { id } = parseParams(idParam, req);
    res.json({ data: await getLot(db, id) });
  });

  r.patch('/:id', ['operator', 'engineer'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const input = parseBody(patchLotSchema, req);
    res.json({ data: await patchLot(db, req.user!, id, input) });
  });

  r.get('/:id/traveller.pdf', 'signed-in', async (req, res) => {
    const { id } = parseParams(idParam, req);
    const { pdf, fileName } = await printLotTraveller(db, req.user!, id);
    res.type('application/pdf');
    res.setHeader('Content-Disposition', `inline; filename="${fileName}"`);
    res.send(pdf);
  });

  return r;
}
