import { idParam } from '../../shared/schemas/api';
import { createRecipeSchema, listRecipesQuerySchema, patchRecipeSchema } from '../../shared/schemas/recipes-api';
import type { Db } from '../db/index';
import { parseBody, parseParams, parseQuery } from '../middleware/validate';
import { createRecipe, getRecipe, listRecipes, patchRecipe } from '../services/recipes.service';
import { defineRoutes } from './define-routes';

export function recipesRoutes(db: Db) {
  const r = defineRoutes('/api/recipes');

  r.get('/', 'signed-in', async (req, res) => {
    const query = parseQuery(listRecipesQuerySchema, req);
    res.json({ data: await listRecipes(db, req.user!, query) });
  });

  // Creating from a whole document is how a JSON export is imported.
  r.post('/', ['engineer', 'lead'], async (req, res) => {
    const input = parseBody(createRecipeSchema, req);
    res.status(201).json({ data: await createRecipe(db, req.user!, input) });
  });

  r.get('/:id', 'signed-in', async (req, res) => {
    const { id } = parseParams(idParam, req);
    res.json({ data: await getRecipe(db, req.user!, id) });
  });

  r.patch('/:id', ['engineer', 'lead'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const input = parseBody(patchRecipeSchema, req);
    res.json({ data: await patchRecipe(db, req.user!, id, input) });
  });

  return r;
}
