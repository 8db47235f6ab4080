// The Bench's sections, each loaded on its own so one failure leaves the others.
// Later issues add "awaiting my sign-off" and "lots in flight" here.
import { ref } from 'vue';
import type { RecipeListRow } from '../../shared/schemas/recipes-api';
import { listRecipes } from '../api/recipes';
import { useAuthStore } from '../stores/auth';
import { useApiError } from './use-api-error';

export const BENCH_ROWS = 8;

export function useBench() {
  const auth = useAuthStore();
  const { report } = useApiError();
  const myDrafts = ref<RecipeListRow[]>([]);
  const myDraftsTotal = ref<number | null>(null);
  const recent = ref<RecipeListRow[]>([]);
  const loading = ref(false);

  async function load(): Promise<void> {
    const me = auth.user;
    if (!me) return;
    loading.value = true;
    const drafts = auth.can(['engineer', 'lead'])
      ? listRecipes({ ownerId: me.id, state: 'draft', sort: 'updatedAt', order: 'desc', pageSize: BENCH_ROWS })
          .then((page) => {
            myDrafts.value = page.rows;
            myDraftsTotal.value = page.total;
          })
          .catch((error) => report(error, { summary: 'Drafts not loaded' }))
      : Promise.resolve();
    const latest = listRecipes({ sort: 'updatedAt', order: 'desc', pageSize: BENCH_ROWS })
      .then((page) => (recent.value = page.rows))
      .catch((error) => report(error, { summary: 'Recent recipes not loaded' }));
    await Promise.all([drafts, latest]);
    loading.value = false;
  }

  return { myDrafts, myDraftsTotal, recent, loading, load };
}
