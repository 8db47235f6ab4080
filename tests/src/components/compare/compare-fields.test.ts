import { describe, expect, it } from 'vitest';
import { newStepOfKind, type RecipeStep } from '../../../../shared/schemas/recipe';
import { fieldLabel, fieldText, stepKeys } from '../../../../src/components/compare/compare-fields';

const tubes = new Map([[3, 'Tube 3 · anneal']]);

describe('compare field labels and values', () => {
  it.each([
    ['tempC', 'anneal', 'Temperature (°C)'],
    ['doseCm2', 'implant', 'Dose (cm⁻²)'],
    ['surface.concentration', 'predeposition', 'Surface concentration (cm⁻³)'],
    ['tubeId', 'anneal', 'Tube'],
    ['background.resistivity', '', 'Resistivity (Ω·cm)'],
  ])('%s of a %s step reads "%s"', (key, kind, label) => expect(fieldLabel(key, kind)).toBe(label));

  it.each([
    ['tubeId', 3, 'Tube 3 · anneal'],
    ['tubeId', 9, 'Tube #9'],
    ['ambient', 'wet-o2', 'Wet O₂ (steam)'],
    ['surface.mode', 'solubility', 'Solid solubility'],
    ['concentrationDependent', true, 'on'],
    ['doseCm2', 5e15, '5e15'],
    ['label', undefined, '—'],
  ])('%s = %j prints as %s', (key, value, text) => expect(fieldText(key, value, tubes)).toBe(text));

  it('lists a furnace step with its tube first and an implant without one', () => {
    expect(stepKeys(newStepOfKind('anneal', 'a'))[0]).toBe('tubeId');
    expect(stepKeys(newStepOfKind('implant', 'i'))).not.toContain('tubeId');
    const fixed = { ...newStepOfKind('predeposition', 'p'), surface: { mode: 'fixed', concentration: 1e20 } } as RecipeStep;
    expect(stepKeys(fixed)).toContain('surface.concentration');
  });
});
