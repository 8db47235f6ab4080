import { describe, expect, it } from 'vitest';
import { bracketSamples, brentRoot, signChanges } from '../../shared/engine/junctions';

describe('brentRoot', () => {
  it.each([
    ['cos x − x', (x: number) => Math.cos(x) - x, 0, 1, 0.7390851332151607], // Dottie number
    ['x³ − 2', (x: number) => x ** 3 - 2, 0, 2, Math.cbrt(2)],
    ['e^x − 10', (x: number) => Math.exp(x) - 10, 0, 5, Math.log(10)],
  ])('finds the root of %s', (_n, f, a, b, root) => {
    expect(brentRoot(f, a, b)).toBeCloseTo(root, 9);
  });
});

describe('signChanges', () => {
  it('finds every crossing, refined between samples rather than snapped to them', () => {
    const f = (x: number) => (x - 0.123456) * (x - 0.5) * (x - 0.87654321);
    const roots = signChanges(f, bracketSamples(1, 10));
    expect(roots).toHaveLength(3);
    expect(roots[0]).toBeCloseTo(0.123456, 9);
    expect(roots[2]).toBeCloseTo(0.87654321, 9);
  });

  it('gives no junction when the sign never changes', () => {
    expect(signChanges((x) => 1 + x, bracketSamples(1, 20))).toEqual([]);
  });
});
