import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../../../../shared/engine';
import { parseRecipeDocument } from '../../../../shared/schemas/recipe';
import { DOPANT_COLOURS, profileFigure } from '../../../../src/components/profile/profile-figure';

function result(anneal = 60) {
  const parsed = parseRecipeDocument({
    schemaVersion: 1,
    substrate: { type: 'p', background: { concentration: 1e15 } },
    steps: [
      { id: 'b', kind: 'implant', dopant: 'B', doseCm2: 1e13, energyKeV: 40, rpUm: 0.13, dRpUm: 0.045 },
      { id: 'p', kind: 'predeposition', dopant: 'P', tempC: 950, timeMin: 20, tubeId: 2 },
      { id: 'a', kind: 'anneal', tempC: 1000, timeMin: anneal, tubeId: 3 },
    ],
  });
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return computeRecipe(parsed.doc);
}
const colours = { showNet: false, textColour: '#000', gridColour: '#ccc' };

describe('profileFigure', () => {
  it('draws each dopant in its family colour, the background dashed, on a log axis in µm', () => {
    const { data, layout } = profileFigure([{ result: result(), label: 'v1' }], colours);
    expect(data.map((t) => t.name)).toEqual(['B (p-type)', 'P (n-type)', 'background (p-type)']);
    expect((data[0].line as { color: string }).color).toBe(DOPANT_COLOURS.B);
    expect((data[2].line as { dash: string }).dash).toBe('dash');
    expect((layout.yaxis as { type: string }).type).toBe('log');
    expect((layout.xaxis as { title: { text: string } }).title.text).toBe('Depth (µm)');
  });

  it('leaves out values a log axis cannot show instead of drawing zeros', () => {
    const { data } = profileFigure([{ result: result(), label: 'v1' }], colours);
    const ys = data.flatMap((t) => t.y as (number | null)[]);
    expect(ys.some((y) => y === null)).toBe(true);
    expect(ys.every((y) => y === null || y > 0)).toBe(true);
  });

  it('marks every junction with a vertical line labelled with its depth in µm', () => {
    const r = result();
    const { layout } = profileFigure([{ result: r, label: 'v1' }], colours);
    expect(r.final.junctionDepthsUm.length).toBeGreaterThan(0);
    expect((layout.shapes as unknown[]).length).toBe(r.final.junctionDepthsUm.length);
    expect((layout.annotations as { text: string }[])[0].text).toMatch(/^xj [\d.]+ µm$/);
  });

  it('overlays a second version dashed, names both, and adds |net| when asked', () => {
    const { data } = profileFigure(
      [
        { result: result(60), label: 'v1' },
        { result: result(120), label: 'v2' },
      ],
      { ...colours, showNet: true },
    );
    const names = data.map((t) => t.name);
    expect(names).toContain('v1 · B (p-type)');
    expect(names).toContain('v2 · B (p-type)');
    expect(names).toContain('v1 · |net|');
    // Same substrate: the background is drawn once.
    expect(names.filter((n) => String(n).includes('background'))).toHaveLength(1);
    expect((data.find((t) => t.name === 'v2 · B (p-type)')!.line as { dash: string }).dash).toBe('dash');
  });
});
