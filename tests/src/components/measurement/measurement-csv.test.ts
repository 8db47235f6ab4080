import { describe, expect, it } from 'vitest';
import {
  declaredUnits,
  lineIssues,
  precheckFile,
  PROFILE_EXAMPLE,
  SHEET_EXAMPLE,
  unitsToAsk,
  uploadFields,
} from '../../../../src/components/measurement/measurement-csv';

const units = { depthUnit: 'um', concentrationUnit: 'cm^-3', sheetUnit: 'ohm/sq' } as const;

describe('declaredUnits', () => {
  it.each([
    ['units in the header brackets', 'depth (nm),concentration (cm^-3)\n0,1e20\n', { depth: 'nm', concentration: 'cm^-3', sheet: null }],
    ['units declared in comments', '# depth_unit: um\n# Concentration unit = m^-3\ndepth,conc\n0,1e26\n', { depth: 'um', concentration: 'm^-3', sheet: null }],
    ['square brackets and another column order', 'c [atoms/cm3],x [µm],note\n1e20,0,a\n', { depth: 'µm', concentration: 'atoms/cm3', sheet: null }],
    ['no units at all', 'depth,concentration\n0,1e20\n', { depth: null, concentration: null, sheet: null }],
    ['a byte-order mark and blank lines first', '\uFEFF\n\n# species: B\ndepth (um),concentration\n0,1\n', { depth: 'um', concentration: null, sheet: null }],
    ['four-point probe with the unit in the header', 'site,sheet_resistance (ohm/sq)\nC,100\n', { depth: null, concentration: null, sheet: 'ohm/sq' }],
    ['four-point probe with # unit:', '# unit: kohm/sq\nsite,rs\nC,1.2\n', { depth: null, concentration: null, sheet: 'kohm/sq' }],
    ['a quoted header cell', '"site","value (Ω/□)"\nC,100\n', { depth: null, concentration: null, sheet: 'Ω/□' }],
  ])('reads %s', (_what, text, expected) => {
    expect(declaredUnits(text)).toEqual(expected);
  });

  it('finds every unit in the format examples the form shows', () => {
    expect(declaredUnits(PROFILE_EXAMPLE)).toMatchObject({ depth: 'nm', concentration: 'cm^-3' });
    expect(declaredUnits(SHEET_EXAMPLE).sheet).toBe('ohm/sq');
  });
});

describe('unitsToAsk', () => {
  it.each([
    ['profile', null, ['depth', 'concentration']],
    ['profile', { depth: 'nm', concentration: null, sheet: null }, ['concentration']],
    ['profile', { depth: 'nm', concentration: 'cm^-3', sheet: null }, []],
    ['sheet_resistance', null, ['sheet']],
    ['sheet_resistance', { depth: 'nm', concentration: null, sheet: null }, ['sheet']],
    ['sheet_resistance', { depth: null, concentration: null, sheet: 'ohm/sq' }, []],
  ] as const)('a %s file declaring %j asks for %j', (kind, declared, expected) => {
    expect(unitsToAsk(kind, declared)).toEqual(expected);
  });
});

describe('precheckFile', () => {
  it.each([
    ['sims.csv', 1000, null],
    ['SIMS.CSV', 1000, null],
    ['probe.txt', 10, null],
    ['sims.csv', 2 * 1024 * 1024, null],
    ['sims.csv', 2 * 1024 * 1024 + 1, 'sims.csv is 2.0 MB; the limit is 2 MB.'],
    ['sims.csv', 0, 'sims.csv is empty.'],
    ['report.pdf', 1000, 'report.pdf is not a CSV file: choose a .csv file.'],
    ['sims.csv.xlsx', 1000, 'sims.csv.xlsx is not a CSV file: choose a .csv file.'],
  ])('%s of %i bytes → %s', (name, size, expected) => {
    expect(precheckFile({ name, size })).toBe(expected);
  });
});

describe('uploadFields', () => {
  it('sends a unit only where the form asked, so it never contradicts the file', () => {
    expect(uploadFields('profile', 'SIMS', units, ['concentration'], '  wafer 7 ')).toEqual({ kind: 'profile', method: 'SIMS', notes: 'wafer 7', concentrationUnit: 'cm^-3' });
    expect(uploadFields('profile', 'spreading resistance', units, [], '')).toEqual({ kind: 'profile', method: 'spreading resistance', notes: '' });
  });

  it('always sends four-point probe as the method of sheet resistance readings', () => {
    expect(uploadFields('sheet_resistance', 'SIMS', units, ['sheet'], '')).toEqual({ kind: 'sheet_resistance', method: 'four-point probe', notes: '', sheetUnit: 'ohm/sq' });
  });
});

describe('lineIssues', () => {
  it('turns file.line.N issues into line → message rows and keeps whole-file problems', () => {
    expect(
      lineIssues([
        { path: 'file.line.3', message: 'Line 3: concentration "oops" must be a number ≥ 0' },
        { path: 'file.line.12', message: 'Line 12: depths must increase from row to row (0.1 after a deeper one)' },
        { path: 'file', message: 'Choose a CSV file' },
      ]),
    ).toEqual([
      { line: 3, message: 'concentration "oops" must be a number ≥ 0' },
      { line: 12, message: 'depths must increase from row to row (0.1 after a deeper one)' },
      { line: null, message: 'Choose a CSV file' },
    ]);
  });
});
