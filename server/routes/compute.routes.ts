import { z } from 'zod';
import { recipeDocumentSchema } from '../../shared/schemas/recipe';
import { computeAuthoritative } from '../services/compute.service';
import { parseBody } from '../middleware/validate';
import { defineRoutes } from './define-routes';
import type { Db } from '../db/index';
import { activeTubeFactors } from '../services/calibrations.service';

/** The body is the recipe document itself, as `npm run compute` reads it. */
const computeBody = z.unknown().pipe(recipeDocumentSchema);

export function computeRoutes(db: Db) {
  const r = defineRoutes('/api');
  r.post('/compute', ['engineer', 'lead', 'admin'], async (req, res) => {
    const doc = parseBody(computeBody, req);
    res.json({ data: computeAuthoritative(doc, await activeTubeFactors(db)) });
  });
  return r;
}
