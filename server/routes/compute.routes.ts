import { z } from 'zod';
import { recipeDocumentSchema } from '../../shared/schemas/recipe';
import { computeAuthoritative } from '../services/compute.service';
import { parseBody } from '../middleware/validate';
import { defineRoutes } from './define-routes';

/** The body is the recipe document itself, as `npm run compute` reads it. */
const computeBody = z.unknown().pipe(recipeDocumentSchema);

export function computeRoutes() {
  const r = defineRoutes('/api');
  r.post('/compute', ['engineer', 'lead', 'admin'], async (req, res) => {
    const doc = parseBody(computeBody, req);
    res.json({ data: computeAuthoritative(doc) });
  });
  return r;
}
