// Acceptance windows printed on the run traveller beside each predicted
// target. These are common practice for a pilot line, not published values;
// a site replaces them with its own specification limits.
export const ACCEPTANCE_WINDOWS = {
  junctionDepthPct: 10,
  sheetResistancePct: 10,
  surfaceConcentrationPct: 25,
  oxideThicknessPct: 5,
} as const;

/** The usual source of each dopant for a furnace predeposition (common practice). */
export const DEFAULT_PREDEP_SOURCE = {
  B: 'BBr3',
  P: 'POCl3',
  As: 'AsH3',
  Sb: 'Sb2O3 solid source',
} as const;
