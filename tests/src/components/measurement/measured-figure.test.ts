import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../../../../shared/engine';
import { parseRecipeDocument } from '../../../../shared/schemas/recipe';
import { measuredColour, overlayFigure, thin } from '../../../../src/components/measurement/measured-figure';
import { DOPANT_COLOURS } from '../../../../src/components/profile/profile-figure';

function boronResult() {
  const parsed = parseRecipeDocument({
    schemaVersion: 1,
    substrate: { type: 'n', background: { concentration: 2e15 } },
    steps: [
      { id: 'p', kind: 'predeposition', dopant: 'B', tempC: 950, timeMin: 30, tubeId: 1 },
      { id: 'a', kind: 'anneal', tempC: 1100, timeMin: 60, tubeId: 3 },
    ],
  });
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return computeRecipe(parsed.doc);
}
const theme = { showNet: false, textColour: '#111111', gridColour: '#cccccc' };
const measured = {
  label: 'measured · sims.csv (SIMS)',
  points: { depthUm: [0, 0.5, 1, 1.5, 2], concentrationCm3: [5e19, 1e19, 1e17, 1e15, 0] },
  junctionsUm: [1.46],
};

describe('overlayFigure', () => {
  const result = boronResult();

  it('keeps the predicted curves solid and the background dashed, and adds the measured profile as open markers', () => {
    const { data } = overlayFigure(result, measured, theme);
    expect(data.map((t) => t.name)).toEqual(['predicted B (p-type)', 'background (n-type)', 'measured · sims.csv (SIMS)']);
    expect((data[0].line as { dash: string }).dash).toBe('solid');
    expect((data[1].line as { dash: string }).dash).toBe('dash');
    expect(data[2].mode).toBe('markers');
    expect((data[2].marker as { symbol: string; color: string })).toMatchObject({ symbol: 'circle-open', color: DOPANT_COLOURS.B });
  });

  it('leaves out measured values a log axis cannot show', () => {
    const { data } = overlayFigure(result, measured, theme);
    expect(data[2].y).toEqual([5e19, 1e19, 1e17, 1e15, null]);
  });

  it('labels the predicted and the measured junction, each with its depth in µm', () => {
    const { layout } = overlayFigure(result, measured, theme);
    const texts = (layout.annotations as { text: string }[]).map((a) => a.text);
    expect(texts).toContain(`measured xj 1.460 µm`);
    expect(texts.filter((t) => t.startsWith('predicted xj '))).toHaveLength(result.final.junctionDepthsUm.length);
    const lines = (layout.shapes as { x0: number; line: { dash: string } }[]).filter((s) => s.line.dash === 'dot');
    expect(lines.map((s) => s.x0)).toEqual([1.46]);
  });

  it('raises the concentration axis when the measured peak is above the predicted one', () => {
    const plain = overlayFigure(result, null, theme).layout.yaxis as { range: number[] };
    const high = { ...measured, points: { depthUm: [0, 1, 2], concentrationCm3: [1e22, 1e18, 1e15] } };
    const raised = overlayFigure(result, high, theme).layout.yaxis as { range: number[] };
    expect(raised.range[1]).toBeCloseTo(Math.log10(3e22), 10);
    expect(raised.range[0]).toBe(plain.range[0]);
  });

  it('draws the prediction alone when there is no measured profile', () => {
    const { data } = overlayFigure(result, null, theme);
    expect(data.some((t) => t.mode === 'markers')).toBe(false);
  });
});

describe('measuredColour', () => {
  it('uses the dopant hue for a one-dopant recipe', () => {
    expect(measuredColour(boronResult(), '#111111')).toBe(DOPANT_COLOURS.B);
  });
});

describe('thin', () => {
  it.each([
    [10, 1500, 10],
    [1500, 1500, 1500],
    [20_000, 1500, 1500],
    [7, 3, 3],
  ])('%i points, at most %i → %i, first and last kept', (n, max, expected) => {
    const values = Array.from({ length: n }, (_, i) => i);
    const out = thin(values, max);
    expect(out).toHaveLength(expected);
    expect(out[0]).toBe(0);
    expect(out.at(-1)).toBe(n - 1);
    expect(out.every((v, i) => i === 0 || v > out[i - 1])).toBe(true);
  });
});
