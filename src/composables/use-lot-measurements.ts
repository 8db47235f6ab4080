// A lot's measured results: the uploaded files (newest first), the server's
// comparison with the prediction, and which measured profile the plot shows.
import { computed, ref, shallowRef, watch } from 'vue';
import type { LotComparison, Measurement, ProfilePoints, ProfileSummary, SheetSummary } from '../../shared/schemas/measurements';
import { listMeasurements } from '../api/measurements';
import { describeError } from './use-api-error';

export function useLotMeasurements(lotId: () => number) {
  const measurements = shallowRef<Measurement[]>([]);
  const comparison = shallowRef<LotComparison | null>(null);
  const loading = ref(false);
  const loadError = ref('');
  /** The profile drawn over the prediction; null means the newest. */
  const chosenProfileId = ref<number | null>(null);

  async function load(): Promise<void> {
    loading.value = true;
    loadError.value = '';
    try {
      const answer = await listMeasurements(lotId());
      measurements.value = answer.measurements;
      comparison.value = answer.comparison;
    } catch (error) {
      loadError.value = describeError(error);
    } finally {
      loading.value = false;
    }
  }

  watch(lotId, () => {
    chosenProfileId.value = null;
    void load();
  }, { immediate: true });

  const profiles = computed(() => measurements.value.filter((m) => m.kind === 'profile'));
  const shownProfile = computed(() => profiles.value.find((m) => m.id === chosenProfileId.value) ?? profiles.value[0] ?? null);
  const measuredSeries = computed(() => {
    const m = shownProfile.value;
    if (!m) return null;
    const summary = m.summary as ProfileSummary;
    return { label: `measured · ${m.fileName} (${m.method})`, points: m.points as ProfilePoints, junctionsUm: summary.junctionDepthsUm, species: summary.species };
  });
  /** The newest four-point-probe set: the one the comparison uses. */
  const latestSheet = computed(() => {
    const m = measurements.value.find((x) => x.kind === 'sheet_resistance');
    return m ? { fileName: m.fileName, summary: m.summary as SheetSummary } : null;
  });
  /** The newest profile: the one the comparison uses. */
  const latestProfile = computed(() => profiles.value[0] ?? null);

  return { measurements, comparison, loading, loadError, chosenProfileId, profiles, shownProfile, measuredSeries, latestSheet, latestProfile, load };
}
