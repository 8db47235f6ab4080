import { describe, expect, it } from 'vitest';
import {
  fileStem,
  formatDeltaPercent,
  formatDeltaSci,
  formatDeltaSig,
  formatMs,
  formatPlain,
  formatSci,
  formatSig,
  toFieldText,
} from '../../../../src/components/recipe/recipe-format';

describe('formatSci', () => {
  it.each([
    [1.234e19, '1.23×10¹⁹'],
    [6.97e14, '6.97×10¹⁴'],
    [1.5138e-13, '1.51×10⁻¹³'],
    [4.2, '4.20'],
    [0, '0'],
    [null, '—'],
    [Number.NaN, '—'],
  ])('%s reads %s', (x, text) => {
    expect(formatSci(x)).toBe(text);
  });
});

describe('formatSig', () => {
  it.each([
    [2.1254353529206593, 4, '2.125'],
    [116.81687544701141, 4, '116.8'],
    [0.0456789, 4, '0.04568'],
    [12345.6, 4, '12346'],
    [0, 4, '0'],
    [undefined, 4, '—'],
  ])('%s to %s significant digits reads %s', (x, sig, text) => {
    expect(formatSig(x, sig)).toBe(text);
  });
});

describe('differences', () => {
  it.each([
    [0.125, '+0.125'],
    [-0.866, '−0.866'],
    [0, '0'],
    [null, '—'],
  ])('formatDeltaSig(%s) = %s', (x, text) => expect(formatDeltaSig(x)).toBe(text));

  it('signs magnitudes in 10ⁿ form', () => {
    expect(formatDeltaSci(-8.12e-10)).toBe('−8.12×10⁻¹⁰');
    expect(formatDeltaSci(1.2e-10)).toBe('+1.20×10⁻¹⁰');
  });

  it('brackets a signed percentage or says nothing', () => {
    expect(formatDeltaPercent(16.04)).toBe(' (+16.0 %)');
    expect(formatDeltaPercent(-66.46)).toBe(' (−66.5 %)');
    expect(formatDeltaPercent(null)).toBe('');
  });
});

describe('toFieldText', () => {
  it.each([
    [1e15, '1e15'],
    [2.5e19, '2.5e19'],
    [1100, '1100'],
    [0.045, '0.045'],
    [0.1 + 0.2, '0.3'],
    [null, ''],
    ['2 h', '2 h'],
  ])('%s shows as %s', (value, text) => expect(toFieldText(value)).toBe(text));
});

describe('fileStem and formatMs', () => {
  it('makes a safe file stem from a recipe name', () => {
    expect(fileStem('Base diffusion · boron 1.5 µm')).toBe('base-diffusion-boron-1-5-m');
    expect(fileStem('Émetteur POCl3')).toBe('emetteur-pocl3');
    expect(fileStem('···')).toBe('recipe');
  });

  it('prints milliseconds with one decimal', () => {
    expect(formatMs(3.14159)).toBe('3.1 ms');
    expect(formatMs(null)).toBe('—');
  });
});

describe('formatPlain', () => {
  it.each([
    [80, '80'],
    [0.246543, '0.2465'],
    [1234.56, '1235'],
    [null, '—'],
  ])('%s reads %s', (x, text) => expect(formatPlain(x)).toBe(text));
});
