import { describe, expect, it } from 'vitest';
import type { CalibrationPoint } from '../../../../shared/schemas/measurements';
import { calibrationFigure, span } from '../../../../src/components/calibration/calibration-figure';

const points: CalibrationPoint[] = [
  { lotId: 1, lotCode: 'L-1', versionId: 1, measuredUm: 1.675, predictedUm: 1.549, correctedUm: 1.674 },
  { lotId: 2, lotCode: 'L-2', versionId: 2, measuredUm: 2.413, predictedUm: 2.233, correctedUm: 2.414 },
];
const theme = { textColour: '#111', gridColour: '#ccc' };

describe('calibrationFigure', () => {
  it('draws y = x across the whole span, and the lots before and after the correction', () => {
    const { data } = calibrationFigure(points, 1.179, theme);
    const [line, before, after] = data;
    const [lo, hi] = span(points);
    expect(line).toMatchObject({ x: [lo, hi], y: [lo, hi] });
    expect(before).toMatchObject({ name: 'before (× 1)', x: [1.549, 2.233], y: [1.675, 2.413], text: ['L-1', 'L-2'] });
    expect(after).toMatchObject({ name: 'after (× 1.179)', x: [1.674, 2.414], y: [1.675, 2.413] });
  });

  it('spans every point with a margin and never below 0', () => {
    const [lo, hi] = span(points);
    expect(lo).toBeLessThan(1.549);
    expect(lo).toBeGreaterThanOrEqual(0);
    expect(hi).toBeGreaterThan(2.414);
    expect(span([])).toEqual([0, 1]);
    expect(span([{ ...points[0], measuredUm: 0.05, predictedUm: 0.05, correctedUm: 0.05 }])[0]).toBeGreaterThanOrEqual(0);
  });
});
