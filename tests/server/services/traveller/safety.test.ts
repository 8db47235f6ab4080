import { describe, expect, it } from 'vitest';
import { SAFETY_DEFERRAL, safetyItemsFor } from '../../../../server/services/traveller/safety';
import { stepsNote } from '../../../../server/services/traveller/traveller-safety-block';
import type { TravellerStep } from '../../../../server/services/traveller/types';
import { emitterSteps, gasSteps } from './traveller-fixtures';

const step = (over: Partial<TravellerStep>): TravellerStep => ({ index: 1, kind: 'anneal', label: 'step', setpoints: [], ...over });
const ids = (steps: TravellerStep[]) => safetyItemsFor(steps).map((i) => i.id);

describe('safetyItemsFor', () => {
  it.each<[string, Partial<TravellerStep>, string]>([
    ['a phosphine predeposition', { kind: 'predeposition', source: 'PH3' }, 'phosphine'],
    ['an arsine predeposition', { kind: 'predeposition', source: 'AsH3' }, 'arsine'],
    ['a diborane predeposition', { kind: 'predeposition', source: 'B2H6' }, 'diborane'],
    ['a gas named in words', { kind: 'predeposition', source: 'phosphine 1 % in N2' }, 'phosphine'],
    ['a POCl3 bubbler', { kind: 'predeposition', source: 'POCl3' }, 'pocl3'],
    ['a BBr3 bubbler', { kind: 'predeposition', source: 'BBr3' }, 'bbr3'],
    ['a boron nitride planar source', { kind: 'predeposition', source: 'BN solid source' }, 'solid-source'],
    ['any predeposition (deglaze in HF follows)', { kind: 'predeposition', source: 'POCl3' }, 'hf'],
    ['a furnace anneal', { kind: 'anneal', ambient: 'N2' }, 'hot-furnace'],
    ['a dry oxidation', { kind: 'oxidation', ambient: 'O2' }, 'hot-furnace'],
    ['a wet oxidation', { kind: 'oxidation', ambient: 'wet O2' }, 'hydrogen'],
    ['a pyrogenic steam oxidation', { kind: 'oxidation', ambient: 'H2 + O2 (pyrogenic)' }, 'hydrogen'],
    ['a forming-gas anneal', { kind: 'anneal', ambient: 'forming gas (H2/N2)' }, 'hydrogen'],
    ['a chlorinated oxidation', { kind: 'oxidation', ambient: 'O2 + 3 % HCl' }, 'chlorinated-ambient'],
    ['an implant', { kind: 'implant', source: 'ion implant' }, 'implanter'],
    ['an arsenic drive-in', { kind: 'anneal', dopant: 'As' }, 'as-sb-residues'],
  ])('cautions about %s', (_what, over, id) => {
    expect(ids([step(over)])).toContain(id);
  });

  it.each<[string, Partial<TravellerStep>, string]>([
    ['a dry oxidation', { kind: 'oxidation', ambient: 'O2' }, 'hydrogen'],
    ['a dry oxidation', { kind: 'oxidation', ambient: 'dry O2' }, 'hf'],
    ['an implant', { kind: 'implant', source: 'ion implant' }, 'hot-furnace'],
    ['an N2 anneal', { kind: 'anneal', ambient: 'N2' }, 'phosphine'],
    ['a POCl3 predeposition', { kind: 'predeposition', source: 'POCl3' }, 'implanter'],
    ['an anneal with a water-vapour note', { kind: 'anneal', ambient: 'N2, H2O-free' }, 'hydrogen'],
  ])('does not caution %s about %s', (_what, over, id) => {
    expect(ids([step(over)])).not.toContain(id);
  });

  it('lists every gas, liquid source, HF, the furnace and the implanter for the mixed demo recipe', () => {
    expect(ids(gasSteps)).toEqual(['arsine', 'phosphine', 'diborane', 'bbr3', 'hf', 'hot-furnace', 'implanter', 'as-sb-residues']);
  });

  it('names the steps that call for each caution', () => {
    const items = safetyItemsFor(emitterSteps);
    expect(items.find((i) => i.id === 'pocl3')?.steps).toEqual([1]);
    expect(items.find((i) => i.id === 'hydrogen')?.steps).toEqual([3]);
    expect(items.find((i) => i.id === 'hot-furnace')?.steps).toEqual([1, 2, 3]);
  });

  it('gives no item twice however many steps call for it', () => {
    const list = ids([...gasSteps, ...gasSteps.map((s) => ({ ...s, index: s.index + 10 }))]);
    expect(new Set(list).size).toBe(list.length);
  });

  it('returns nothing for a recipe without steps (the deferral is still printed separately)', () => {
    expect(safetyItemsFor([])).toEqual([]);
  });

  it.each([
    ['phosphine', ['toxic', 'flammable', 'gas cabinet', 'detection']],
    ['arsine', ['toxic', 'flammable', 'gas cabinet', 'detection']],
    ['diborane', ['toxic', 'flammable', 'gas cabinet', 'detection']],
    ['pocl3', ['corrosive', 'moist air', 'HCl']],
    ['bbr3', ['corrosive', 'water', 'HBr']],
    ['hf', ['hours later', 'systemic', 'calcium gluconate']],
    ['hot-furnace', ['1000 °C', 'thermal shock', 'gloves']],
    ['hydrogen', ['flammable', 'interlocks']],
    ['implanter', ['high voltage', 'X-rays']],
  ])('the %s caution speaks of %j', (id, words) => {
    const text = safetyItemsFor([...gasSteps, ...emitterSteps, step({ kind: 'predeposition', source: 'POCl3' })]).find((i) => i.id === id)!.text;
    for (const word of words) expect(text.toLowerCase()).toContain(word.toLowerCase());
  });

  it('quotes no exposure limits or other figures that belong in the SDS', () => {
    const all = safetyItemsFor([...gasSteps, ...emitterSteps, step({ kind: 'oxidation', ambient: 'O2 + HCl' }), step({ source: 'BN solid source', kind: 'predeposition' })]);
    for (const item of all) expect(item.text, item.id).not.toMatch(/\d+(\.\d+)?\s*(ppm|ppb|mg|%|min|h\b|hours?\b)/i);
  });
});

describe('SAFETY_DEFERRAL', () => {
  it.each(['EHS procedures', 'Safety Data Sheet (SDS)', 'local codes', 'licensed practice', 'do not replace'])('names %s', (words) => {
    expect(SAFETY_DEFERRAL).toContain(words);
  });
});

describe('stepsNote', () => {
  it.each<[number[], string]>([
    [[], ''],
    [[3], 'step 3'],
    [[1, 2], 'steps 1, 2'],
    [[1, 2, 3], 'steps 1–3'],
    [[1, 2, 3, 5, 7, 8, 9, 10, 12], 'steps 1–3, 5, 7–10, 12'],
  ])('writes %j as "%s"', (steps, expected) => {
    expect(stepsNote(steps)).toBe(expected);
  });
});
