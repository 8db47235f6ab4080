// The upload form's state: the chosen file is checked in the browser first
// (size, name) and its header read for declared units, so the form asks only
// for the units the file leaves out. A refused file's line errors are kept for
// the table; nothing is stored on the server in that case.
import { computed, reactive, ref, shallowRef, watch } from 'vue';
import type { Measurement, MeasurementKind } from '../../shared/schemas/measurements';
import { uploadMeasurement } from '../api/measurements';
import { ApiError } from '../api/client';
import {
  declaredUnits,
  lineIssues,
  precheckFile,
  unitsToAsk,
  uploadFields,
  type DeclaredUnits,
  type LineIssue,
  type UnitChoice,
} from '../components/measurement/measurement-csv';
import { describeError } from './use-api-error';

/** The header and declarations sit in the first lines; 64 KB is plenty to find them. */
const HEAD_BYTES = 64 * 1024;

export function useMeasurementUpload(lotId: () => number, onStored: (m: Measurement) => void) {
  const kind = ref<MeasurementKind>('profile');
  const method = ref<string>('SIMS');
  const units = reactive<UnitChoice>({ depthUnit: 'um', concentrationUnit: 'cm^-3', sheetUnit: 'ohm/sq' });
  const notes = ref('');
  const file = shallowRef<File | null>(null);
  const declared = ref<DeclaredUnits | null>(null);
  const fileProblem = ref('');
  /** The refused file's name and its problems, line by line. */
  const refused = ref<{ fileName: string; message: string; lines: LineIssue[] } | null>(null);
  const failure = ref('');
  const busy = ref(false);

  const ask = computed(() => unitsToAsk(kind.value, declared.value));
  const canSend = computed(() => file.value !== null && fileProblem.value === '' && !busy.value);

  watch(kind, (k) => {
    method.value = k === 'profile' ? 'SIMS' : 'four-point probe';
    refused.value = null;
  });

  async function choose(chosen: File | null): Promise<void> {
    refused.value = null;
    failure.value = '';
    declared.value = null;
    file.value = chosen;
    fileProblem.value = chosen ? (precheckFile(chosen) ?? '') : '';
    if (!chosen || fileProblem.value) return;
    try {
      declared.value = declaredUnits(await chosen.slice(0, HEAD_BYTES).text());
    } catch {
      fileProblem.value = `${chosen.name} could not be read.`;
    }
  }

  async function submit(): Promise<boolean> {
    if (!file.value || fileProblem.value) return false;
    busy.value = true;
    refused.value = null;
    failure.value = '';
    try {
      const stored = await uploadMeasurement(lotId(), file.value, uploadFields(kind.value, method.value, units, ask.value, notes.value));
      onStored(stored);
      notes.value = '';
      await choose(null);
      return true;
    } catch (error) {
      if (error instanceof ApiError && error.code === 'invalid_file') {
        refused.value = { fileName: file.value.name, message: error.message, lines: lineIssues(error.issues) };
      } else {
        const issues = error instanceof ApiError ? error.issues.map((i) => i.message).filter((m) => m !== error.message) : [];
        failure.value = [describeError(error), ...issues].join(' ');
      }
      return false;
    } finally {
      busy.value = false;
    }
  }

  return { kind, method, units, notes, file, declared, fileProblem, refused, failure, busy, ask, canSend, choose, submit };
}
