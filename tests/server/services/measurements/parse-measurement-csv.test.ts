import { describe, expect, it } from 'vitest';
import { parseProfileCsv, parseSheetCsv } from '../../../../server/services/measurements/parse-measurement-csv';

describe('parseProfileCsv', () => {
  it.each([
    ['units in the header', 'depth (nm),concentration (cm^-3)\n0,1e20\n10,5e19\n20,1e19\n', {}],
    ['units declared above the header', '# depth_unit: nm\n# concentration_unit: atoms/cm3\ndepth,concentration\n0,1e20\n10,5e19\n20,1e19\n', {}],
    ['units chosen in the form', 'depth,concentration\r\n0,1e20\r\n10,5e19\r\n20,1e19\r\n', { depthUnit: 'nm' as const, concentrationUnit: 'cm^-3' as const }],
    ['µm spelled with a micro sign and a BOM', '\uFEFFdepth (µm),concentration (cm-3)\n0,1e20\n0.01,5e19\n0.02,1e19\n', {}],
  ])('reads a good file with %s, converting to µm and cm⁻³', (_what, text, form) => {
    const r = parseProfileCsv(text, form);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.points.depthUm).toEqual([0, 0.01, 0.02]);
    expect(r.points.concentrationCm3).toEqual([1e20, 5e19, 1e19]);
  });

  it('converts m^-3 and cm depths', () => {
    const r = parseProfileCsv('depth (cm),concentration (m^-3)\n0,1e26\n1e-5,1e25\n2e-5,1e24\n', {});
    expect(r.ok && r.points.depthUm.map((x) => +x.toFixed(6))).toEqual([0, 0.1, 0.2]);
    expect(r.ok && r.points.concentrationCm3).toEqual([1e20, 1e19, 1e18]);
  });

  it('reports every bad row with its line number in the file', () => {
    const text = '# comment line 1\ndepth (um),concentration (cm^-3)\n0,1e20\n0.1,abc\n0.05,1e19\n-1,1e18\n0.3,1e17,9\n';
    const r = parseProfileCsv(text, {});
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues.map((i) => i.path)).toEqual(['file.line.4', 'file.line.5', 'file.line.6', 'file.line.7']);
    expect(r.issues[0].message).toMatch(/^Line 4: concentration "abc"/);
    expect(r.issues[1].message).toMatch(/increase/);
    expect(r.issues[3].message).toMatch(/expected 2 columns, found 3/);
  });

  it.each([
    ['no unit anywhere', 'depth,concentration\n0,1\n1,2\n2,3\n', {}, /no depth unit/],
    ['a unit the file and the form disagree on', 'depth (nm),concentration (cm^-3)\n0,1\n1,2\n2,3\n', { depthUnit: 'um' as const }, /make them agree/],
    ['an unknown unit', 'depth (furlong),concentration (cm^-3)\n0,1\n1,2\n2,3\n', {}, /not one of/],
    ['wrong columns', 'x1,y1\n0,1\n', {}, /depth and concentration/],
    ['a header only', 'depth (um),concentration (cm^-3)\n', {}, /no data rows/],
    ['too few points', 'depth (um),concentration (cm^-3)\n0,1\n1,1\n', {}, /at least 3/],
    ['binary content', 'PK\u0003\u0004\u0000\u0000', {}, /not a text file/],
    ['an empty file', '', {}, /no header/],
  ])('refuses %s', (_what, text, form, message) => {
    const r = parseProfileCsv(text, form);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues[0].message).toMatch(message);
  });
});

describe('parseSheetCsv', () => {
  it('reads sites and converts kΩ/sq', () => {
    const r = parseSheetCsv('site,sheet_resistance (kohm/sq)\nC,0.1012\nN,0.099\n', {});
    expect(r.ok && r.points).toEqual({ sites: ['C', 'N'], ohmSq: [101.2, 99] });
  });

  it('refuses repeated sites and values that are not positive, by line', () => {
    const r = parseSheetCsv('site,rs (ohm/sq)\nC,100\nC,101\nE,0\nW,\n', {});
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.issues.map((i) => i.path)).toEqual(['file.line.3', 'file.line.4', 'file.line.5']);
  });
});
