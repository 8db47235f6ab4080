// The Calibration screen's state: the chosen tube (kept in the URL, ?tube=ID,
// so a view can be shared), its fits newest first, and fitting a new one.
import { computed, ref, shallowRef, watch } from 'vue';
import { useRoute, useRouter } from 'vue-router';
import type { Calibration } from '../../shared/schemas/measurements';
import { fitCalibration, getActiveFactors, listCalibrations } from '../api/calibrations';
import { ApiError } from '../api/client';
import { useTubesStore } from '../stores/tubes';
import { describeError, useApiError } from './use-api-error';

const queryId = (v: unknown) => (typeof v === 'string' && /^\d+$/.test(v) ? Number(v) : null);

export function useTubeCalibrations() {
  const route = useRoute();
  const router = useRouter();
  const tubes = useTubesStore();
  const { report } = useApiError();
  const history = shallowRef<Calibration[]>([]);
  const loading = ref(false);
  const loadError = ref('');
  const fitting = ref(false);
  /** Why the last fit was refused (422 cannot_fit), in the server's words. */
  const fitRefusal = ref('');
  const calibrated = ref<Set<number>>(new Set());

  const tubeId = computed({
    get: () => queryId(route.query.tube),
    set: (id: number | null) => void router.replace({ query: { ...route.query, tube: id ?? undefined } }),
  });
  const tube = computed(() => tubes.items.find((t) => t.id === tubeId.value) ?? null);
  const inForce = computed(() => history.value[0] ?? null);

  async function load(id: number | null): Promise<void> {
    history.value = [];
    loadError.value = '';
    fitRefusal.value = '';
    if (id === null) return;
    loading.value = true;
    try {
      history.value = await listCalibrations(id);
    } catch (error) {
      loadError.value = describeError(error);
    } finally {
      loading.value = false;
    }
  }

  async function fit(note: string): Promise<Calibration | null> {
    if (tubeId.value === null) return null;
    fitting.value = true;
    fitRefusal.value = '';
    try {
      const made = await fitCalibration(tubeId.value, note);
      history.value = [made, ...history.value];
      calibrated.value = new Set([...calibrated.value, made.tubeId]);
      return made;
    } catch (error) {
      if (error instanceof ApiError && error.code === 'cannot_fit') fitRefusal.value = error.message;
      else report(error, { summary: 'Not fitted' });
      return null;
    } finally {
      fitting.value = false;
    }
  }

  /** Without ?tube, opens the first tube that has a calibration (else the first tube). */
  async function start(): Promise<void> {
    try {
      const [, factors] = await Promise.all([tubes.loaded ? Promise.resolve() : tubes.load(), getActiveFactors()]);
      calibrated.value = new Set(Object.keys(factors).map(Number));
    } catch (error) {
      report(error, { summary: 'Tubes not loaded' });
    }
    if (tubeId.value === null) tubeId.value = tubes.sorted.find((t) => calibrated.value.has(t.id))?.id ?? tubes.sorted[0]?.id ?? null;
  }

  watch(tubeId, load, { immediate: true });
  void start();

  return { tubes, tubeId, tube, history, inForce, loading, loadError, fitting, fitRefusal, calibrated, fit };
}
