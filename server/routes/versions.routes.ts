import { idParam } from '../../shared/schemas/api';
import { copyVersionSchema, saveVersionSchema } from '../../shared/schemas/recipes-api';
import type { Db } from '../db/index';
import { parseBody, parseParams } from '../middleware/validate';
import { copyVersion, getVersion, saveDraft } from '../services/recipes.service';
import { printVersionTraveller } from '../services/traveller/print.service';
import { defineRoutes } from './define-routes';

export function versionsRoutes(db: Db) {
  const r = defineRoutes('/api/versions');

  r.get('/:id', 'signed-in', async (req, res) => {
    const { id } = parseParams(idParam, req);
    res.json({ data: await getVersion(db, req.user!, id) });
  });

  r.put('/:id', ['engineer', 'lead'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const input = parseBody(saveVersionSchema, req);
    res.json({ data: await saveDraft(db, req.user!, id, input) });
  });

  r.post('/:id/copy', ['engineer', 'lead'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const { note } = parseBody(copyVersionSchema, req);
    res.status(201).json({ data: await copyVersion(db, req.user!, id, note) });
  });

  r.get('/:id/traveller.pdf', 'signed-in', async (req, res) => {
    const { id } = parseParams(idParam, req);
    const { pdf, fileName } = await printVersionTraveller(db, req.user!, id);
    res.type('application/pdf');
    res.setHeader('Content-Disposition', `inline; filename="${fileName}"`);
    res.send(pdf);
  });

  return r;
}
