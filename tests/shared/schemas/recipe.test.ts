import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { newRecipeDocument, newStepOfKind, parseRecipeDocument, STEP_KINDS } from '../../../shared/schemas/recipe';
import { parseQuantity, QUANTITY_KINDS } from '../../../shared/schemas/quantity';

const base = (steps: unknown[], extra: Record<string, unknown> = {}) => ({
  schemaVersion: 1,
  substrate: { type: 'n', background: { concentration: 1e15 } },
  steps,
  ...extra,
});
const anneal = (over: Record<string, unknown> = {}) => ({ id: 'a', kind: 'anneal', tempC: 1000, timeMin: 30, ...over });

describe('quantities with units (parsed by mathjs)', () => {
  it.each([
    ['temperature', '1050 degC', 1050],
    ['temperature', '1050 °C', 1050],
    ['temperature', '1050 C', 1050],
    ['temperature', '1323.15 K', 1050],
    ['time', '30 min', 30],
    ['time', '2 h', 120],
    ['time', '90 s', 1.5],
    ['length', '2 um', 2],
    ['length', '0.5 µm', 0.5],
    ['length', '100 nm', 0.1],
    ['dose', '5e15 cm^-2', 5e15],
    ['dose', '5e15 cm-2', 5e15],
    ['energy', '40 keV', 40],
    ['concentration', '1e19 cm^-3', 1e19],
    ['concentration', '1e19 cm⁻³', 1e19],
    ['resistivity', '10 ohm cm', 10],
    ['resistivity', '10 Ω·cm', 10],
    ['rampRate', '5 degC/min', 5],
    ['temperature', '1050', 1050],
  ] as const)('%s "%s" reads as %d in the canonical unit', (kind, text, value) => {
    const r = parseQuantity(text, QUANTITY_KINDS[kind], 'Field');
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.value).toBeCloseTo(value, 6);
  });

  it.each([
    ['temperature', '30 min'],
    ['time', 'soon'],
    ['length', '5 keV'],
  ] as const)('%s "%s" is refused with a message naming the quantity', (kind, text) => {
    const r = parseQuantity(text, QUANTITY_KINDS[kind], 'Field');
    expect(r).toMatchObject({ ok: false });
    if (!r.ok) expect(r.message).toContain(QUANTITY_KINDS[kind].noun);
  });
});

describe('parseRecipeDocument', () => {
  it('normalises strings with units into numbers in canonical units and fills defaults', () => {
    const r = parseRecipeDocument(base([anneal({ tempC: '1100 degC', timeMin: '1 h', loadTempC: '800 degC' })]));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.doc.steps[0]).toMatchObject({ tempC: 1100, timeMin: 60, loadTempC: 800, rampUpCPerMin: 10, rampDownCPerMin: 5, ambient: 'inert', tubeId: null });
    expect(r.doc.options).toEqual({ method: 'auto', implantSurface: 'reflect', concentrationDependent: false, useTubeCalibration: false, points: 400, depthUm: null });
    expect(r.doc.parameterSet).toBe('fair-1981');
    expect(r.doc.substrate.orientation).toBe('100');
  });

  it('takes the setpoint as load temperature when none is given (no ramps)', () => {
    const r = parseRecipeDocument(base([anneal()]));
    expect(r.ok && r.doc.steps[0].kind === 'anneal' && r.doc.steps[0].loadTempC).toBe(1000);
  });

  it.each([
    [[anneal({ tempC: 1400 })], 'steps.0.tempC', 'Temperature must be between 500 and 1300 °C'],
    [[anneal({ tempC: '1050 furlongs' })], 'steps.0.tempC', 'could not read'],
    [[anneal({ timeMin: -1 })], 'steps.0.timeMin', 'Time at setpoint must be between 0 and 10000 min'],
    [[anneal({ kind: 'bake' })], 'steps.0.kind', 'Step kind must be one of'],
    [[anneal(), anneal()], 'steps.1.id', 'used twice'],
    [[anneal({ loadTempC: 1100 })], 'steps.0.loadTempC', 'must not be above the setpoint'],
    [[{ id: 'i', kind: 'implant', dopant: 'Ga', doseCm2: 1e15, rpUm: 0.1, dRpUm: 0.03 }], 'steps.0.dopant', 'Dopant must be one of'],
    [[{ id: 'i', kind: 'implant', dopant: 'B', rpUm: 0.1, dRpUm: 0.03 }], 'steps.0.doseCm2', 'Enter dose'],
  ])('refuses a bad step with a human message at the field path (%#)', (steps, path, message) => {
    const r = parseRecipeDocument(base(steps));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const issue = r.issues.find((i) => i.path === path);
    expect(issue, JSON.stringify(r.issues)).toBeDefined();
    expect(issue!.message).toContain(message);
  });

  it.each([
    [{ concentration: 1e15, resistivity: 10 }, 'not both'],
    [{}, 'concentration or a resistivity'],
  ])('refuses an ambiguous background %j', (background, message) => {
    const r = parseRecipeDocument({ schemaVersion: 1, substrate: { type: 'p', background }, steps: [] });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.map((i) => `${i.path}: ${i.message}`).join('\n')).toContain(message);
  });

  it('refuses an unknown parameter set and a wrong schema version, naming the fields', () => {
    const r = parseRecipeDocument({ ...base([]), schemaVersion: 2, parameterSet: 'mine' });
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues.map((i) => i.path).sort()).toEqual(['parameterSet', 'schemaVersion']);
  });

  it.each([null, 42, 'recipe', []])('answers %j with issues, never a throw', (input) => {
    const r = parseRecipeDocument(input);
    expect(r.ok).toBe(false);
  });

  it.each(STEP_KINDS)('newStepOfKind(%s) gives a step the schema accepts', (kind) => {
    const doc = { ...newRecipeDocument(), steps: [newStepOfKind(kind, 'x')] };
    const r = parseRecipeDocument(doc);
    expect(r.ok, JSON.stringify(!r.ok && r.issues)).toBe(true);
  });

  it('accepts the documented worked example', () => {
    const text = readFileSync(new URL('../../../shared/schemas/examples/boron-two-step.recipe.json', import.meta.url), 'utf8');
    const r = parseRecipeDocument(JSON.parse(text));
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.doc.substrate.background).toEqual({ resistivity: 5 });
  });
});
