import { idParam } from '../../shared/schemas/api';
import { createUserSchema, patchUserSchema } from '../../shared/schemas/users';
import type { Db } from '../db/index';
import { parseBody, parseParams } from '../middleware/validate';
import { createUser, listPeopleDirectory, listUsers, patchUser } from '../services/users.service';
import { defineRoutes } from './define-routes';

export function usersRoutes(db: Db) {
  const r = defineRoutes('/api/users');

  r.get('/', ['admin'], async (_req, res) => {
    res.json({ data: await listUsers(db) });
  });

  r.get('/directory', 'signed-in', async (_req, res) => {
    res.json({ data: await listPeopleDirectory(db) });
  });

  r.post('/', ['admin'], async (req, res) => {
    const input = parseBody(createUserSchema, req);
    res.status(201).json({ data: await createUser(db, req.user!, input) });
  });

  r.patch('/:id', ['admin'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const input = parseBody(patchUserSchema, req);
    res.json({ data: await patchUser(db, req.user!, id, input) });
  });

  return r;
}
