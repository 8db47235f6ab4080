import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../../../../shared/engine';
import { parseRecipeDocument } from '../../../../shared/schemas/recipe';
import { profileCsv } from '../../../../src/components/profile/profile-csv';

describe('profileCsv', () => {
  it('writes depth, each dopant and net doping with units in the header, read back exactly by a CSV parser', () => {
    const parsed = parseRecipeDocument({
      schemaVersion: 1,
      substrate: { type: 'p', background: { concentration: 1e15 } },
      steps: [
        { id: 'i', kind: 'implant', dopant: 'As', doseCm2: 5e15, energyKeV: 50, rpUm: 0.033, dRpUm: 0.012 },
        { id: 'a', kind: 'anneal', tempC: 1000, timeMin: 30, tubeId: 3 },
      ],
    });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    const { profile } = computeRecipe(parsed.doc);
    const rows = parse(profileCsv(profile), { columns: true, cast: true }) as Record<string, number>[];
    expect(Object.keys(rows[0])).toEqual(['depth_um', 'As_cm-3', 'net_cm-3']);
    expect(rows).toHaveLength(profile.depthUm.length);
    const k = 17;
    expect(rows[k].depth_um).toBe(profile.depthUm[k]);
    expect(rows[k]['As_cm-3']).toBe(profile.dopants[0].concentrationCm3[k]);
    expect(rows[k]['net_cm-3']).toBe(profile.netCm3[k]);
  });
});
