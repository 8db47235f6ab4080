// State of the Recipes table in lazy mode: the server pages, sorts and
// filters; this turns the table's events and the filter bar into the list
// query and reloads. A filter change goes back to the first page.
import { reactive, ref, watch } from 'vue';
import type { Dopant } from '../../shared/engine/dopants';
import type { ListRecipesQuery, VersionState } from '../../shared/schemas/recipes-api';
import { RECIPE_SORTS } from '../../shared/schemas/recipes-api';
import { useRecipesStore } from '../stores/recipes';
import { useApiError } from './use-api-error';

export interface RecipeFilters {
  name: string;
  dopant: Dopant | null;
  state: VersionState | null;
  ownerId: number | null;
  tubeId: number | null;
  /** First and last day of the last change (YYYY-MM-DD, read as UTC days by the server). */
  changedFrom: string | null;
  changedTo: string | null;
}

export interface TableView {
  first: number;
  rows: number;
  sortField: string;
  sortOrder: 1 | -1;
}

type Sort = (typeof RECIPE_SORTS)[number];
const isSort = (s: string): s is Sort => (RECIPE_SORTS as readonly string[]).includes(s);

/** The API query for a table view and its filters (unset filters are left out). */
export function toListQuery(view: TableView, filters: RecipeFilters): ListRecipesQuery {
  const query: ListRecipesQuery = {
    page: Math.floor(view.first / view.rows) + 1,
    pageSize: view.rows,
    sort: isSort(view.sortField) ? view.sortField : 'updatedAt',
    order: view.sortOrder === 1 ? 'asc' : 'desc',
  };
  const name = filters.name.trim();
  if (name) query.name = name;
  if (filters.dopant) query.dopant = filters.dopant;
  if (filters.state) query.state = filters.state;
  if (filters.ownerId) query.ownerId = filters.ownerId;
  if (filters.tubeId) query.tubeId = filters.tubeId;
  if (filters.changedFrom) query.changedFrom = filters.changedFrom;
  if (filters.changedTo) query.changedTo = filters.changedTo;
  return query;
}

export function useRecipesTable() {
  const store = useRecipesStore();
  const { report } = useApiError();
  const view = reactive<TableView>({ first: 0, rows: 20, sortField: 'updatedAt', sortOrder: -1 });
  const filters = reactive<RecipeFilters>({ name: '', dopant: null, state: null, ownerId: null, tubeId: null, changedFrom: null, changedTo: null });
  const nameText = ref('');
  let nameTimer: ReturnType<typeof setTimeout> | undefined;

  function reload(): void {
    store.load(toListQuery(view, filters)).catch((error) => report(error, { summary: 'Recipes not loaded' }));
  }

  function onPage(event: { first: number; rows: number }): void {
    view.first = event.first;
    view.rows = event.rows;
    reload();
  }

  function onSort(event: { sortField?: unknown; sortOrder?: number | null }): void {
    view.sortField = typeof event.sortField === 'string' ? event.sortField : 'updatedAt';
    view.sortOrder = event.sortOrder === 1 ? 1 : -1;
    view.first = 0;
    reload();
  }

  // Typing a name waits for a pause; the other filters apply at once.
  watch(nameText, (text) => {
    clearTimeout(nameTimer);
    nameTimer = setTimeout(() => (filters.name = text), 250);
  });
  watch(
    () => ({ ...filters }),
    () => {
      view.first = 0;
      reload();
    },
  );

  return { store, view, filters, nameText, reload, onPage, onSort };
}
