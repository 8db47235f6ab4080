// Field-level differences between two recipe documents, for the Compare screen.
// Steps pair up by id first (a step keeps its id when edited, duplicated steps
// get a new one), then leftovers at the same position and of the same kind;
// everything else is added or removed. Pure data in, pure data out.
// Order: B's steps, with each removed step just before the first B step at or
// after its old position.
import type { RecipeDocument, RecipeStep } from '../schemas/recipe';

export type Scalar = string | number | boolean | null;

/** One field that differs; `field` is a dotted path inside its section (e.g. 'surface.mode'). */
export interface FieldChange {
  field: string;
  before: Scalar | undefined;
  after: Scalar | undefined;
}

export type StepStatus = 'added' | 'removed' | 'changed' | 'unchanged';

export interface StepDiff {
  status: StepStatus;
  /** How the two sides were paired; null for an added or removed step. */
  matchedBy: 'id' | 'position' | null;
  /** The step in document A (null when added) with its 0-based index. */
  a: { index: number; step: RecipeStep } | null;
  /** The step in document B (null when removed) with its 0-based index. */
  b: { index: number; step: RecipeStep } | null;
  /** Changed fields, 'position' first when a step moved. Empty unless status is 'changed'. */
  changes: FieldChange[];
}

export interface DocumentDiff {
  substrate: FieldChange[];
  parameterSet: FieldChange[];
  options: FieldChange[];
  /** In document B's order, removed steps placed where they stood in A. */
  steps: StepDiff[];
  counts: Record<StepStatus, number>;
  /** True when anything at all differs. */
  changed: boolean;
}

/** Flattens nested plain objects into dotted keys; arrays are compared as JSON text. */
export function flattenFields(value: object, prefix = '', out: Record<string, Scalar> = {}): Record<string, Scalar> {
  for (const [key, v] of Object.entries(value)) {
    const path = prefix ? `${prefix}.${key}` : key;
    if (v !== null && typeof v === 'object' && !Array.isArray(v)) flattenFields(v, path, out);
    else if (Array.isArray(v)) out[path] = JSON.stringify(v);
    else if (v !== undefined) out[path] = v as Scalar;
  }
  return out;
}

/** The fields that differ between two flat records, in the order they appear (B's keys first). */
export function diffFields(a: object, b: object, ignore: readonly string[] = []): FieldChange[] {
  const fa = flattenFields(a);
  const fb = flattenFields(b);
  const keys = [...new Set([...Object.keys(fb), ...Object.keys(fa)])].filter((k) => !ignore.includes(k));
  return keys.filter((k) => !Object.is(fa[k], fb[k])).map((k) => ({ field: k, before: fa[k], after: fb[k] }));
}

function pairSteps(a: RecipeStep[], b: RecipeStep[]): { bToA: (number | null)[]; how: ('id' | 'position' | null)[] } {
  const bToA: (number | null)[] = b.map(() => null);
  const how: ('id' | 'position' | null)[] = b.map(() => null);
  const aTaken = new Set<number>();
  const aById = new Map(a.map((s, i) => [s.id, i]));
  b.forEach((step, j) => {
    const i = aById.get(step.id);
    if (i !== undefined && !aTaken.has(i)) {
      bToA[j] = i;
      how[j] = 'id';
      aTaken.add(i);
    }
  });
  b.forEach((step, j) => {
    if (bToA[j] !== null || j >= a.length || aTaken.has(j) || a[j].kind !== step.kind) return;
    bToA[j] = j;
    how[j] = 'position';
    aTaken.add(j);
  });
  return { bToA, how };
}

function stepChanges(a: RecipeStep, ai: number, b: RecipeStep, bi: number): FieldChange[] {
  const changes = diffFields(a, b, ['id']);
  return ai === bi ? changes : [{ field: 'position', before: ai + 1, after: bi + 1 }, ...changes];
}

/** Differences from document A to document B: substrate, parameter set, options and each step. */
export function diffDocuments(a: RecipeDocument, b: RecipeDocument): DocumentDiff {
  const { bToA, how } = pairSteps(a.steps, b.steps);
  const matchedA = new Set(bToA.filter((i): i is number => i !== null));
  const steps: StepDiff[] = [];
  let nextRemoved = 0;
  const flushRemovedBefore = (limit: number) => {
    for (; nextRemoved < limit; nextRemoved++) {
      if (!matchedA.has(nextRemoved)) {
        steps.push({ status: 'removed', matchedBy: null, a: { index: nextRemoved, step: a.steps[nextRemoved] }, b: null, changes: [] });
      }
    }
  };
  b.steps.forEach((step, j) => {
    const i = bToA[j];
    if (i === null) {
      // A step removed at or before this position reads first: "was this, now that".
      flushRemovedBefore(Math.min(j + 1, a.steps.length));
      steps.push({ status: 'added', matchedBy: null, a: null, b: { index: j, step }, changes: [] });
      return;
    }
    flushRemovedBefore(i);
    const changes = stepChanges(a.steps[i], i, step, j);
    steps.push({
      status: changes.length ? 'changed' : 'unchanged',
      matchedBy: how[j],
      a: { index: i, step: a.steps[i] },
      b: { index: j, step },
      changes,
    });
  });
  flushRemovedBefore(a.steps.length);

  const counts: Record<StepStatus, number> = { added: 0, removed: 0, changed: 0, unchanged: 0 };
  for (const s of steps) counts[s.status] += 1;
  const substrate = diffFields(a.substrate, b.substrate);
  const parameterSet = diffFields({ parameterSet: a.parameterSet }, { parameterSet: b.parameterSet });
  const options = diffFields(a.options, b.options);
  const changed =
    substrate.length + parameterSet.length + options.length + counts.added + counts.removed + counts.changed > 0;
  return { substrate, parameterSet, options, steps, counts, changed };
}
