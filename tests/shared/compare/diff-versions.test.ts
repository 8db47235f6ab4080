import { describe, expect, it } from 'vitest';
import { diffDocuments, diffFields, flattenFields } from '../../../shared/compare/diff-versions';
import { newRecipeDocument, newStepOfKind, type RecipeDocument, type RecipeStep } from '../../../shared/schemas/recipe';

function doc(steps: RecipeStep[], patch: Partial<RecipeDocument> = {}): RecipeDocument {
  return { ...newRecipeDocument(), steps, ...patch };
}
const predep = (id: string, extra: Partial<RecipeStep> = {}) => ({ ...newStepOfKind('predeposition', id), ...extra }) as RecipeStep;
const anneal = (id: string, extra: Partial<RecipeStep> = {}) => ({ ...newStepOfKind('anneal', id), ...extra }) as RecipeStep;
const implant = (id: string) => newStepOfKind('implant', id);

describe('flattenFields', () => {
  it('turns nested objects into dotted keys and keeps arrays as text', () => {
    expect(flattenFields({ a: 1, surface: { mode: 'fixed', concentration: 1e20 }, list: [1, 2], gone: undefined })).toEqual({
      a: 1,
      'surface.mode': 'fixed',
      'surface.concentration': 1e20,
      list: '[1,2]',
    });
  });
});

describe('diffFields', () => {
  it('lists only the fields that differ, with before and after, ignoring the named ones', () => {
    expect(diffFields({ id: 'x', tempC: 1000, timeMin: 30 }, { id: 'y', tempC: 1050, timeMin: 30 }, ['id'])).toEqual([
      { field: 'tempC', before: 1000, after: 1050 },
    ]);
  });

  it('reports a field present on one side only', () => {
    expect(diffFields({ surface: { mode: 'solubility' } }, { surface: { mode: 'fixed', concentration: 1e20 } })).toEqual([
      { field: 'surface.mode', before: 'solubility', after: 'fixed' },
      { field: 'surface.concentration', before: undefined, after: 1e20 },
    ]);
  });
});

describe('diffDocuments', () => {
  it('finds nothing between a document and its copy', () => {
    const a = doc([predep('p'), anneal('d')]);
    const d = diffDocuments(a, structuredClone(a));
    expect(d.changed).toBe(false);
    expect(d.counts).toEqual({ added: 0, removed: 0, changed: 0, unchanged: 2 });
    expect(d.steps.every((s) => s.matchedBy === 'id')).toBe(true);
  });

  it('reports the changed field of a step matched by id', () => {
    const d = diffDocuments(doc([predep('p'), anneal('d')]), doc([predep('p'), anneal('d', { tempC: 1050 })]));
    expect(d.counts.changed).toBe(1);
    expect(d.steps[1]).toMatchObject({ status: 'changed', matchedBy: 'id', changes: [{ field: 'tempC', before: 1100, after: 1050 }] });
  });

  it('pairs steps by position and kind when ids differ (e.g. an imported copy)', () => {
    const d = diffDocuments(doc([predep('a1'), anneal('a2')]), doc([predep('b1'), anneal('b2', { timeMin: 90 })]));
    expect(d.steps.map((s) => [s.status, s.matchedBy])).toEqual([
      ['unchanged', 'position'],
      ['changed', 'position'],
    ]);
  });

  it('does not pair steps of different kinds by position: one removed, one added', () => {
    const d = diffDocuments(doc([predep('a1')]), doc([implant('b1')]));
    expect(d.steps.map((s) => s.status)).toEqual(['removed', 'added']);
    expect(d.counts).toMatchObject({ added: 1, removed: 1, changed: 0 });
  });

  it('places a removed step where it stood in A and an added step where it stands in B', () => {
    const a = doc([predep('p'), anneal('x'), anneal('d')]);
    const b = doc([predep('p'), anneal('d'), anneal('n', { ambient: 'dry-o2' })]);
    const d = diffDocuments(a, b);
    expect(d.steps.map((s) => `${s.status}:${s.a?.step.id ?? '-'}>${s.b?.step.id ?? '-'}`)).toEqual([
      'unchanged:p>p',
      'removed:x>-',
      'changed:d>d',
      'added:->n',
    ]);
    // d moved from position 3 to 2: reported as a change of position.
    expect(d.steps[2].changes).toEqual([{ field: 'position', before: 3, after: 2 }]);
  });

  it('reports swapped steps as moved, both matched by id', () => {
    const d = diffDocuments(doc([predep('p'), anneal('d')]), doc([anneal('d'), predep('p')]));
    expect(d.steps.map((s) => [s.b?.step.id, s.changes[0]?.field])).toEqual([
      ['d', 'position'],
      ['p', 'position'],
    ]);
  });

  it('reports substrate, parameter set and option changes by field', () => {
    const a = doc([]);
    const b = doc([], {
      substrate: { type: 'n', background: { resistivity: 5 }, orientation: '100' },
      parameterSet: 'fuller-jaeger',
      options: { ...a.options, concentrationDependent: true },
    });
    const d = diffDocuments(a, b);
    expect(d.substrate).toEqual([
      { field: 'type', before: 'p', after: 'n' },
      { field: 'background.resistivity', before: undefined, after: 5 },
      { field: 'background.concentration', before: 1e15, after: undefined },
    ]);
    expect(d.parameterSet).toEqual([{ field: 'parameterSet', before: 'fair-1981', after: 'fuller-jaeger' }]);
    expect(d.options).toEqual([{ field: 'concentrationDependent', before: false, after: true }]);
    expect(d.changed).toBe(true);
  });
});
