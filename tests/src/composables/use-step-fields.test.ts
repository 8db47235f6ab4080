import { describe, expect, it } from 'vitest';
import {
  addStep,
  duplicateStep,
  fieldsOfStep,
  moveStep,
  readField,
  removeStep,
  STEP_FIELDS,
  writeField,
  type EditableStep,
} from '../../../src/composables/use-step-fields';
import { newStepOfKind, parseRecipeDocument, newRecipeDocument, STEP_KINDS } from '../../../shared/schemas/recipe';

const step = (kind: (typeof STEP_KINDS)[number], id: string) => newStepOfKind(kind, id) as EditableStep;

describe('STEP_FIELDS', () => {
  it.each(STEP_KINDS)('every %s field exists in a new step of that kind, and every quantity has a unit', (kind) => {
    const s = step(kind, 'x');
    for (const f of STEP_FIELDS[kind]) {
      expect(readField(s, f.key), f.key).not.toBeUndefined();
      if (f.input === 'quantity') expect(f.unit).not.toBe('');
    }
  });

  it('shows the surface concentration field only for a fixed-surface predeposition', () => {
    const s = step('predeposition', 'p');
    expect(fieldsOfStep(s).some((f) => f.key === 'surface.concentration')).toBe(false);
    writeField(s, 'surface.mode', 'fixed');
    const keys = fieldsOfStep(s).map((f) => f.key);
    expect(keys.indexOf('surface.concentration')).toBe(keys.indexOf('surface.mode') + 1);
  });
});

describe('readField / writeField', () => {
  it('reads and writes dotted paths, and removes a field written as undefined', () => {
    const s = step('anneal', 'a');
    writeField(s, 'surface.concentration', 1e20);
    expect(readField(s, 'surface.concentration')).toBe(1e20);
    writeField(s, 'loadTempC', undefined);
    expect('loadTempC' in s).toBe(false);
  });
});

describe('step list operations', () => {
  const list = () => [step('predeposition', 'a'), step('anneal', 'b'), step('oxidation', 'c')];

  it('adds a step of the kind at the end with defaults that parse', () => {
    const steps = addStep([], 'implant');
    expect(steps.map((s) => s.kind)).toEqual(['implant']);
    expect(parseRecipeDocument({ ...newRecipeDocument(), steps }).ok).toBe(true);
  });

  it('duplicates right after the original with a new id and equal fields', () => {
    const steps = duplicateStep(list(), 0);
    expect(steps.map((s) => s.kind)).toEqual(['predeposition', 'predeposition', 'anneal', 'oxidation']);
    expect(steps[1].id).not.toBe('a');
    expect({ ...steps[1], id: 'a' }).toEqual(steps[0]);
    expect(parseRecipeDocument({ ...newRecipeDocument(), steps }).ok).toBe(true);
  });

  it('moves up and down and ignores moves past either end', () => {
    expect(moveStep(list(), 1, -1).map((s) => s.id)).toEqual(['b', 'a', 'c']);
    expect(moveStep(list(), 1, 1).map((s) => s.id)).toEqual(['a', 'c', 'b']);
    expect(moveStep(list(), 0, -1).map((s) => s.id)).toEqual(['a', 'b', 'c']);
    expect(moveStep(list(), 2, 1).map((s) => s.id)).toEqual(['a', 'b', 'c']);
  });

  it('removes by index without touching the input list', () => {
    const before = list();
    expect(removeStep(before, 1).map((s) => s.id)).toEqual(['a', 'c']);
    expect(before).toHaveLength(3);
  });
});
