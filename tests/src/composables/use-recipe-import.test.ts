import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { checkImportText, nameFromFileName } from '../../../src/composables/use-recipe-import';

const example = readFileSync('shared/schemas/examples/boron-two-step.recipe.json', 'utf8');

describe('checkImportText', () => {
  it('accepts the documented example export', () => {
    expect(checkImportText(example)).toMatchObject({ ok: true, stepCount: 2 });
  });

  it('says when the file is not JSON at all', () => {
    const check = checkImportText('{"schemaVersion": 1,');
    expect(check.ok).toBe(false);
    if (!check.ok) expect(check.issues[0].message).toMatch(/^Not valid JSON/);
  });

  it('points at each bad field by path', () => {
    const doc = JSON.parse(example);
    doc.steps[0].tempC = 1400;
    doc.steps[1].kind = 'bake';
    const check = checkImportText(JSON.stringify(doc));
    expect(check.ok).toBe(false);
    if (!check.ok) {
      expect(check.issues.map((i) => i.path)).toEqual(['steps.0.tempC', 'steps.1.kind']);
      expect(check.issues[0].message).toMatch(/between 500 and 1300 °C/);
    }
  });
});

describe('nameFromFileName', () => {
  it.each([
    ['boron-base-v3.recipe.json', 'boron base v3'],
    ['emitter_POCl3.json', 'emitter POCl3'],
    ['plain', 'plain'],
  ])('%s → %s', (file, name) => expect(nameFromFileName(file)).toBe(name));
});
