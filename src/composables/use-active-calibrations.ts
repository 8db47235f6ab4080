// The diffusivity factor in force per tube (GET /api/calibrations/active),
// shared by every screen that predicts in the browser. Each new user asks the
// server again, so a fit made a moment ago on the Calibration screen counts.
import { computed, ref, shallowRef } from 'vue';
import type { TubeFactors } from '../../shared/engine';
import { getActiveFactors } from '../api/calibrations';
import { describeError } from './use-api-error';

const factors = shallowRef<TubeFactors>({});
const loaded = ref(false);
const loadError = ref('');
let pending: Promise<void> | null = null;

function refresh(): Promise<void> {
  pending ??= getActiveFactors()
    .then((f) => {
      factors.value = f;
      loaded.value = true;
      loadError.value = '';
    })
    .catch((error) => {
      loadError.value = describeError(error);
    })
    .finally(() => {
      pending = null;
    });
  return pending;
}

export function useActiveCalibrations() {
  void refresh();
  /** The factor in force for a tube, or null when it has no fit. */
  const factorOf = (tubeId: number | null) => (tubeId === null ? null : (factors.value[tubeId] ?? null));
  return { factors, loaded, loadError, refresh, factorOf, calibratedTubeIds: computed(() => Object.keys(factors.value).map(Number)) };
}
