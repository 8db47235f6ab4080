import { describe, expect, it } from 'vitest';
import table from '../../reference/implant-ranges.json';
import { implantTableRangeKeV, typicalImplant } from '../../shared/engine/implant-table';
import { DOPANTS, type Dopant } from '../../shared/engine/dopants';
import { EngineInputError } from '../../shared/engine/errors';

const rows = DOPANTS.flatMap((d) => (table.dopants as Record<Dopant, number[][]>)[d].map(([e, rp, drp]) => [d, e, rp, drp] as [Dopant, number, number, number]));

describe('typicalImplant (Gibbons, Johnson & Mylroie 1975 table in reference/implant-ranges.json)', () => {
  it.each(rows)('%s at %i keV returns the tabulated Rp = %f µm, ΔRp = %f µm', (d, e, rp, drp) => {
    const r = typicalImplant(d, e);
    expect(r?.rpUm).toBeCloseTo(rp, 12);
    expect(r?.dRpUm).toBeCloseTo(drp, 12);
  });

  it('interpolates monotonically between tabulated energies', () => {
    for (const d of DOPANTS) {
      let prev = 0;
      for (let e = 10; e <= 200; e += 1) {
        const rp = typicalImplant(d, e)!.rpUm;
        expect(rp).toBeGreaterThan(prev);
        prev = rp;
      }
    }
  });

  it('puts light ions deeper at equal energy, as LSS theory does: B > P > As > Sb', () => {
    for (const e of [20, 50, 100, 180]) {
      const rp = (d: Dopant) => typicalImplant(d, e)!.rpUm;
      expect(rp('B')).toBeGreaterThan(rp('P'));
      expect(rp('P')).toBeGreaterThan(rp('As'));
      expect(rp('As')).toBeGreaterThan(rp('Sb'));
    }
  });

  it('returns null outside the table (10–200 keV)', () => {
    expect(implantTableRangeKeV('As')).toEqual([10, 200]);
    expect(typicalImplant('B', 5)).toBeNull();
    expect(typicalImplant('B', 201)).toBeNull();
  });

  it.each([
    ['energyKeV', () => typicalImplant('B', 0)],
    ['energyKeV', () => typicalImplant('B', Number.NaN)],
    ['dopant', () => typicalImplant('In' as Dopant, 50)],
  ])('refuses a bad %s', (path, call) => {
    expect(call).toThrow(EngineInputError);
    expect(call).toThrowError(expect.objectContaining({ path }));
  });
});
