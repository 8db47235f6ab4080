// The Compare screen's state lives in the URL (?a=VERSION_ID&b=VERSION_ID), so
// a comparison can be shared. Each side loads its version and its recipe's
// version list (for the pickers); the diff and the deltas are pure functions.
import { computed, reactive, ref, watch } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import { diffDocuments } from '../../shared/compare/diff-versions';
import { diffOutcomes } from '../../shared/compare/diff-outcomes';
import type { RecipeDetail, RecipeListRow, RecipeVersion } from '../../shared/schemas/recipes-api';
import { getRecipe, listRecipes } from '../api/recipes';
import { getVersion } from '../api/versions';
import { describeError, useApiError } from './use-api-error';

export type Side = 'a' | 'b';

interface SideState {
  version: RecipeVersion | null;
  recipe: RecipeDetail | null;
  error: string;
  loading: boolean;
}

const queryId = (v: unknown) => (typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : null);

/** 'v3' when both sides are versions of one recipe, otherwise 'Recipe name v3'. */
export function sideLabel(v: Pick<RecipeVersion, 'recipeName' | 'versionNo' | 'recipeId'> | null, other: Pick<RecipeVersion, 'recipeId'> | null, fallback: string): string {
  if (!v) return fallback;
  return other && other.recipeId === v.recipeId ? `v${v.versionNo}` : `${v.recipeName} v${v.versionNo}`;
}

export function useVersionCompare() {
  const route = useRoute();
  const router = useRouter();
  const { report } = useApiError();
  const sides = reactive<Record<Side, SideState>>({
    a: { version: null, recipe: null, error: '', loading: false },
    b: { version: null, recipe: null, error: '', loading: false },
  });
  const recipes = ref<RecipeListRow[]>([]);

  async function loadSide(side: Side, id: number | null): Promise<void> {
    const s = sides[side];
    s.error = '';
    if (id === null) {
      s.version = null;
      return;
    }
    if (s.version?.id === id) return;
    s.loading = true;
    try {
      const version = await getVersion(id);
      s.version = version;
      if (s.recipe?.id !== version.recipeId) s.recipe = await getRecipe(version.recipeId);
    } catch (error) {
      s.version = null;
      s.error = describeError(error);
    } finally {
      s.loading = false;
    }
  }

  function choose(side: Side, versionId: number | null): void {
    void router.replace({ query: { ...route.query, [side]: versionId ?? undefined } });
  }

  /** Picks a recipe for one side and shows its newest version. */
  async function chooseRecipe(side: Side, recipeId: number): Promise<void> {
    try {
      const detail = await getRecipe(recipeId);
      sides[side].recipe = detail;
      choose(side, detail.versions[0]?.id ?? null);
    } catch (error) {
      report(error, { summary: 'Recipe not loaded' });
    }
  }

  watch(() => queryId(route.query.a), (id) => loadSide('a', id), { immediate: true });
  watch(() => queryId(route.query.b), (id) => loadSide('b', id), { immediate: true });
  listRecipes({ pageSize: 100, sort: 'name', order: 'asc' })
    .then((page) => (recipes.value = page.rows))
    .catch((error) => report(error, { summary: 'Recipes not loaded' }));

  const ready = computed(() => sides.a.version !== null && sides.b.version !== null);
  const diff = computed(() => (sides.a.version && sides.b.version ? diffDocuments(sides.a.version.document, sides.b.version.document) : null));
  const deltas = computed(() => (ready.value ? diffOutcomes(sides.a.version!.result, sides.b.version!.result) : null));
  const labels = computed(() => ({
    a: sideLabel(sides.a.version, sides.b.version, 'A'),
    b: sideLabel(sides.b.version, sides.a.version, 'B'),
  }));

  return { sides, recipes, ready, diff, deltas, labels, choose, chooseRecipe };
}
