import { idParam } from '../../shared/schemas/api';
import { createTubeSchema, patchTubeSchema } from '../../shared/schemas/tubes';
import type { Db } from '../db/index';
import { parseBody, parseParams } from '../middleware/validate';
import { createTube, getTube, listTubes, patchTube } from '../services/tubes.service';
import { defineRoutes } from './define-routes';

export function tubesRoutes(db: Db) {
  const r = defineRoutes('/api/tubes');

  r.get('/', 'signed-in', async (_req, res) => {
    res.json({ data: await listTubes(db) });
  });

  r.get('/:id', 'signed-in', async (req, res) => {
    const { id } = parseParams(idParam, req);
    res.json({ data: await getTube(db, id) });
  });

  r.post('/', ['admin'], async (req, res) => {
    const input = parseBody(createTubeSchema, req);
    res.status(201).json({ data: await createTube(db, req.user!, input) });
  });

  r.patch('/:id', ['admin'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const input = parseBody(patchTubeSchema, req);
    res.json({ data: await patchTube(db, req.user!, id, input) });
  });

  return r;
}
