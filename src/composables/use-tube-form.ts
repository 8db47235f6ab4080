import { reactive, ref } from 'vue';
import {
  createTubeSchema,
  type Ambient,
  type CreateTubeInput,
  type PatchTubeInput,
  type Tube,
  type TubeDedication,
} from '../../shared/schemas/tubes';
import { useTubesStore } from '../stores/tubes';
import { useFormErrors } from './use-form-errors';
import { useApiError } from './use-api-error';

interface TubeFormState {
  name: string;
  dedication: TubeDedication | null;
  minTempC: number | null;
  maxTempC: number | null;
  ambients: Ambient[];
  notes: string;
}

const TUBE_FIELDS = ['name', 'dedication', 'minTempC', 'maxTempC', 'ambients', 'notes'] as const;

/** Valid values for every field but the temperature pair (see addRangeMessage). */
const RANGE_PROBE = { name: 'probe', dedication: 'undoped', ambients: ['inert'], notes: '' } as const;

function blank(): TubeFormState {
  return { name: '', dedication: null, minTempC: null, maxTempC: null, ambients: [], notes: '' };
}

function sameValue(a: unknown, b: unknown): boolean {
  if (Array.isArray(a) && Array.isArray(b)) return [...a].sort().join('|') === [...b].sort().join('|');
  return a === b;
}

/** Only the fields that differ from the stored tube, so a PATCH says what changed. */
export function changedTubeFields(tube: Tube, next: CreateTubeInput): PatchTubeInput {
  const patch: Record<string, unknown> = {};
  for (const field of TUBE_FIELDS) {
    if (!sameValue(tube[field], next[field])) patch[field] = next[field];
  }
  return patch as PatchTubeInput;
}

/** State and saving for the create/edit tube dialog; the shared zod schema checks it first. */
export function useTubeForm() {
  const store = useTubesStore();
  const { report } = useApiError();
  const { errors, formError, validate, clear } = useFormErrors();
  const form = reactive<TubeFormState>(blank());
  const editing = ref<Tube | null>(null);
  const saving = ref(false);

  function reset(tube: Tube | null): void {
    editing.value = tube;
    Object.assign(form, tube ? { ...tube, ambients: [...tube.ambients] } : blank());
    clear();
  }

  /**
   * zod runs the schema's min-below-max rule only once every field parses;
   * check the pair alone too, so that message shows with the others.
   */
  function addRangeMessage(): void {
    if (errors.value.minTempC || errors.value.maxTempC) return;
    const pairOnly = createTubeSchema.safeParse({ ...RANGE_PROBE, minTempC: form.minTempC, maxTempC: form.maxTempC });
    const issue = pairOnly.success ? undefined : pairOnly.error.issues.find((i) => i.path[0] === 'maxTempC');
    if (issue) errors.value = { ...errors.value, maxTempC: issue.message };
  }

  /** Saves and returns the tube, or null when nothing was saved (messages are shown). */
  async function save(): Promise<Tube | null> {
    const input = validate(createTubeSchema, form);
    if (!input) {
      addRangeMessage();
      return null;
    }
    const tube = editing.value;
    const patch = tube ? changedTubeFields(tube, input) : null;
    if (tube && patch && Object.keys(patch).length === 0) return tube; // nothing changed
    saving.value = true;
    try {
      return tube && patch ? await store.update(tube.id, patch) : await store.create(input);
    } catch (error) {
      report(error, { fields: errors, knownFields: TUBE_FIELDS, summary: 'Tube not saved' });
      return null;
    } finally {
      saving.value = false;
    }
  }

  return { form, editing, errors, formError, saving, reset, save };
}
