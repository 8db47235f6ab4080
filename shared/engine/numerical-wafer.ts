// The wafer on the finite-volume grid: one concentration array per dopant.
import { DOPANT_INFO, type Dopant } from './dopants';
import type { DopingAt } from './layer';
import { implantProfile, implantRetainedDose, type ImplantSurface } from './profiles-analytic';
import {
  createWorkspace,
  diffuseCoupled,
  diffuseUniform,
  gridDose,
  interpolateProfile,
  shiftProfile,
  surfaceRefinedGrid,
  type CoupledSpecies,
  type FdGrid,
  type FdWorkspace,
  type SurfaceCondition,
  type TemperatureSegment,
} from './solver-fd';

export interface NumericalWafer {
  grid: FdGrid;
  ws: FdWorkspace;
  conc: Map<Dopant, Float64Array>;
  timeSteps: number;
}

export function createNumericalWafer(depthCm: number, nodes: number, timeSteps: number): NumericalWafer {
  const grid = surfaceRefinedGrid(depthCm, nodes);
  return { grid, ws: createWorkspace(grid.n), conc: new Map(), timeSteps };
}

export function speciesArray(w: NumericalWafer, d: Dopant): Float64Array {
  let c = w.conc.get(d);
  if (!c) {
    c = new Float64Array(w.grid.n);
    w.conc.set(d, c);
  }
  return c;
}

/**
 * Samples a concentration function onto the grid (hand-over from the analytic path),
 * scaled so the grid holds exactly doseCm2: the hand-over neither makes nor loses dopant.
 */
export function loadProfile(w: NumericalWafer, d: Dopant, f: (xCm: number) => number, doseCm2: number): void {
  const c = speciesArray(w, d);
  for (let i = 0; i < w.grid.n; i++) c[i] = f(w.grid.xCm[i]);
  const onGrid = gridDose(c, w.grid);
  if (onGrid > 0 && doseCm2 > 0) for (let i = 0; i < w.grid.n; i++) c[i] *= doseCm2 / onGrid;
}

/** Adds an implanted Gaussian, scaled so the grid holds exactly the retained dose. */
export function implantNumerical(w: NumericalWafer, d: Dopant, doseCm2: number, rpCm: number, dRpCm: number, surface: ImplantSurface): void {
  const c = speciesArray(w, d);
  const tmp = w.ws.scratch;
  for (let i = 0; i < w.grid.n; i++) tmp[i] = implantProfile(doseCm2, rpCm, dRpCm, 0, surface, w.grid.xCm[i]);
  const onGrid = gridDose(tmp, w.grid);
  const scale = onGrid > 0 ? implantRetainedDose(doseCm2, rpCm, dRpCm, surface) / onGrid : 0;
  for (let i = 0; i < w.grid.n; i++) c[i] += tmp[i] * scale;
}

/**
 * Diffuses every species through one furnace step. Constant D in space: each species
 * by its own Dt (exact for any temperature history). Concentration-dependent: the
 * coupled solver through the temperature segments.
 */
export function diffuseNumerical(
  w: NumericalWafer,
  dtByDopant: Record<Dopant, { totalCm2: number }>,
  fixedSurface: { dopant: Dopant; valueCm3: number } | null,
  coupled: null | {
    segments: TemperatureSegment[];
    backgroundNetCm3: number;
    sign: (d: Dopant) => 1 | -1;
    diffusivity: (d: Dopant, tempC: number, electronsCm3: number) => number;
    intrinsicCarriers: (tempC: number) => number;
  },
): void {
  if (fixedSurface) speciesArray(w, fixedSurface.dopant);
  const surfaceOf = (d: Dopant): SurfaceCondition =>
    fixedSurface && fixedSurface.dopant === d ? { kind: 'fixed', valueCm3: fixedSurface.valueCm3 } : { kind: 'closed' };
  if (!coupled) {
    for (const [d, c] of w.conc) diffuseUniform(c, w.grid, dtByDopant[d].totalCm2, surfaceOf(d), w.ws, w.timeSteps);
    return;
  }
  const species: CoupledSpecies[] = [...w.conc].map(([d, c]) => ({
    c,
    sign: coupled.sign(d),
    surface: surfaceOf(d),
    diffusivity: (t, n) => coupled.diffusivity(d, t, n),
  }));
  diffuseCoupled(species, coupled.backgroundNetCm3, w.grid, coupled.segments, coupled.intrinsicCarriers, w.ws);
}

/**
 * Consumes δ of silicon (oxidation-effect.ts): shifts every profile and returns the kept
 * fraction of the consumed dose as a thin reflecting sheet (width δ) at the new surface.
 * @returns dose taken up by the oxide per dopant, cm⁻²
 */
export function consumeSiliconNumerical(w: NumericalWafer, deltaCm: number, kept: Record<Dopant, number>): Partial<Record<Dopant, number>> {
  const lost: Partial<Record<Dopant, number>> = {};
  if (!(deltaCm > 0)) return lost;
  const sheet = new Float64Array(w.grid.n);
  for (let i = 0; i < w.grid.n; i++) sheet[i] = implantProfile(1, 0, deltaCm, 0, 'reflect', w.grid.xCm[i]);
  const sheetDose = gridDose(sheet, w.grid);
  for (const [d, c] of w.conc) {
    const layer = shiftProfile(c, w.grid, deltaCm, w.ws);
    const back = layer * kept[d];
    if (back > 0 && sheetDose > 0) for (let i = 0; i < w.grid.n; i++) c[i] += (back / sheetDose) * sheet[i];
    lost[d] = layer - back;
  }
  return lost;
}

export function numericalConcentration(w: NumericalWafer, d: Dopant, xCm: number): number {
  const c = w.conc.get(d);
  return c ? Math.max(0, interpolateProfile(c, w.grid, xCm)) : 0;
}

export function numericalDose(w: NumericalWafer, d: Dopant): number {
  const c = w.conc.get(d);
  return c ? gridDose(c, w.grid) : 0;
}

/** Net and total doping at x from the solver's interpolants, background included. */
export function numericalDopingAt(w: NumericalWafer, backgroundSignedCm3: number, xCm: number, out: DopingAt): DopingAt {
  let net = backgroundSignedCm3;
  let total = Math.abs(backgroundSignedCm3);
  for (const [d, c] of w.conc) {
    const v = Math.max(0, interpolateProfile(c, w.grid, xCm));
    net += DOPANT_INFO[d].type === 'n' ? v : -v;
    total += v;
  }
  out.net = net;
  out.total = total;
  return out;
}
