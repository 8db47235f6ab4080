import { describe, expect, it } from 'vitest';
import { listRecipesQuerySchema } from '../../../shared/schemas/recipes-api';
import { toListQuery, type RecipeFilters } from '../../../src/composables/use-recipes-table';
import { recipesQueryString } from '../../../src/api/recipes';

const none: RecipeFilters = { name: '', dopant: null, state: null, ownerId: null, tubeId: null, changedFrom: null, changedTo: null };

describe('toListQuery', () => {
  it('turns the table position into a 1-based page and the sort into field and order', () => {
    expect(toListQuery({ first: 40, rows: 20, sortField: 'name', sortOrder: 1 }, none)).toEqual({
      page: 3,
      pageSize: 20,
      sort: 'name',
      order: 'asc',
    });
  });

  it('falls back to the last change, newest first, for a column the server cannot sort', () => {
    expect(toListQuery({ first: 0, rows: 10, sortField: 'dopants', sortOrder: -1 }, none)).toMatchObject({ sort: 'updatedAt', order: 'desc' });
  });

  it('sends only the filters that are set, with the name trimmed', () => {
    const q = toListQuery({ first: 0, rows: 20, sortField: 'updatedAt', sortOrder: -1 }, { ...none, name: '  boron ', dopant: 'B', ownerId: 4 });
    expect(q).toEqual({ page: 1, pageSize: 20, sort: 'updatedAt', order: 'desc', name: 'boron', dopant: 'B', ownerId: 4 });
  });

  it('sends the last-change days as they are, and an open end not at all', () => {
    const q = toListQuery({ first: 0, rows: 20, sortField: 'updatedAt', sortOrder: -1 }, { ...none, changedFrom: '2026-03-01' });
    expect(q).toMatchObject({ changedFrom: '2026-03-01' });
    expect(q).not.toHaveProperty('changedTo');
  });

  it('produces a query string the server schema accepts as it is', () => {
    const q = toListQuery({ first: 20, rows: 10, sortField: 'owner', sortOrder: 1 }, { ...none, state: 'released', tubeId: 2, changedFrom: '2026-03-01', changedTo: '2026-03-09' });
    const params = Object.fromEntries(new URLSearchParams(recipesQueryString(q).slice(1)));
    expect(listRecipesQuerySchema.parse(params)).toEqual({ page: 3, pageSize: 10, sort: 'owner', order: 'asc', state: 'released', tubeId: 2, changedFrom: '2026-03-01', changedTo: '2026-03-09' });
  });
});
