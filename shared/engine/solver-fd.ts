// 1-D finite-volume diffusion solver: nodes on a geometric grid refined toward the
// surface, θ-scheme in time (a few backward-Euler steps first to damp the
// Crank–Nicolson oscillations of a sharp start, then Crank–Nicolson), Thomas
// algorithm. A closed surface and a closed bottom conserve Σ wᵢCᵢ to round-off.
// Work arrays are allocated once per grid; nothing is allocated in the inner loops.

/** A grid of n nodes from the surface (x = 0) to depthCm, spacing hᵢ = h0·rⁱ. */
export interface FdGrid {
  n: number;
  xCm: Float64Array;
  /** Control-volume width of each node, cm (Σ = depth). */
  widthCm: Float64Array;
  /** Spacing between node i and i+1, cm (length n − 1). */
  spacingCm: Float64Array;
  firstSpacingCm: number;
  ratio: number;
  depthCm: number;
}

/** Default solver resolution: junction depth converged to < 0.5 % (tests/engine/solver-fd.test.ts). */
export const DEFAULT_GRID_NODES = 320;
export const DEFAULT_TIME_STEPS = 80;
/** Largest / smallest spacing of the grid. */
const STRETCH = 100;
/** Backward-Euler steps before Crank–Nicolson (Rannacher start-up). */
const IMPLICIT_START_STEPS = 2;
/** Last / first time step: diffusion smooths the profile, so later steps may be longer. */
const STEP_SPREAD = 10;

/** Geometric grid refined toward the surface. */
export function surfaceRefinedGrid(depthCm: number, nodes: number = DEFAULT_GRID_NODES): FdGrid {
  const n = Math.max(8, Math.floor(nodes));
  const ratio = Math.pow(STRETCH, 1 / (n - 2));
  const h0 = (depthCm * (ratio - 1)) / (Math.pow(ratio, n - 1) - 1);
  const xCm = new Float64Array(n);
  const spacingCm = new Float64Array(n - 1);
  const widthCm = new Float64Array(n);
  let h = h0;
  for (let i = 0; i < n - 1; i++) {
    spacingCm[i] = h;
    xCm[i + 1] = xCm[i] + h;
    h *= ratio;
  }
  xCm[n - 1] = depthCm; // remove round-off at the bottom
  spacingCm[n - 2] = depthCm - xCm[n - 2];
  for (let i = 0; i < n; i++) {
    const left = i > 0 ? spacingCm[i - 1] : 0;
    const right = i < n - 1 ? spacingCm[i] : 0;
    widthCm[i] = 0.5 * (left + right);
  }
  return { n, xCm, widthCm, spacingCm, firstSpacingCm: h0, ratio, depthCm };
}

/** Scratch arrays for one grid. */
export interface FdWorkspace {
  sub: Float64Array;
  diag: Float64Array;
  sup: Float64Array;
  rhs: Float64Array;
  faceK: Float64Array;
  scratch: Float64Array;
}

export function createWorkspace(n: number): FdWorkspace {
  return {
    sub: new Float64Array(n),
    diag: new Float64Array(n),
    sup: new Float64Array(n),
    rhs: new Float64Array(n),
    faceK: new Float64Array(n),
    scratch: new Float64Array(n),
  };
}

/** Surface condition: closed (zero flux: anneal, oxidation) or fixed concentration (predeposition). */
export type SurfaceCondition = { kind: 'closed' } | { kind: 'fixed'; valueCm3: number };

/** Σ wᵢCᵢ: the dose on the grid, cm⁻² (trapezoidal rule on the nodes). */
export function gridDose(c: Float64Array, grid: FdGrid): number {
  let s = 0;
  for (let i = 0; i < grid.n; i++) s += grid.widthCm[i] * c[i];
  return s;
}

/**
 * Solves the tridiagonal system in ws (sub, diag, sup, rhs) into out (Thomas algorithm;
 * the matrix is diagonally dominant, so no pivoting is needed).
 */
function thomas(ws: FdWorkspace, n: number, out: Float64Array): void {
  const { sub, diag, sup, rhs, scratch } = ws;
  let beta = diag[0];
  out[0] = rhs[0] / beta;
  for (let i = 1; i < n; i++) {
    scratch[i] = sup[i - 1] / beta;
    beta = diag[i] - sub[i] * scratch[i];
    out[i] = (rhs[i] - sub[i] * out[i - 1]) / beta;
  }
  for (let i = n - 2; i >= 0; i--) out[i] -= scratch[i + 1] * out[i + 1];
}

/**
 * One θ-step of ∂C/∂t = ∂/∂x(D ∂C/∂x) with face conductances already in ws.faceK:
 * faceK[i] = Δt·D(i+½)/hᵢ (cm). Updates c in place.
 */
function thetaStep(c: Float64Array, grid: FdGrid, theta: number, surface: SurfaceCondition, ws: FdWorkspace): void {
  const n = grid.n;
  const { sub, diag, sup, rhs, faceK } = ws;
  const w = grid.widthCm;
  const explicit = 1 - theta;
  for (let i = 0; i < n; i++) {
    const kl = i > 0 ? faceK[i - 1] : 0;
    const kr = i < n - 1 ? faceK[i] : 0;
    sub[i] = -theta * kl;
    sup[i] = -theta * kr;
    diag[i] = w[i] + theta * (kl + kr);
    const fl = i > 0 ? kl * (c[i - 1] - c[i]) : 0;
    const fr = i < n - 1 ? kr * (c[i + 1] - c[i]) : 0;
    rhs[i] = w[i] * c[i] + explicit * (fl + fr);
  }
  if (surface.kind === 'fixed') {
    diag[0] = 1;
    sup[0] = 0;
    rhs[0] = surface.valueCm3;
  }
  thomas(ws, n, c);
}

/** Sizes of `steps` time steps growing geometrically and summing to total, written into out[0..steps). */
function stepSizes(total: number, steps: number, out: Float64Array): void {
  if (steps === 1) {
    out[0] = total;
    return;
  }
  const growth = Math.pow(STEP_SPREAD, 1 / (steps - 1));
  let s = (total * (growth - 1)) / (Math.pow(growth, steps) - 1);
  for (let k = 0; k < steps; k++) {
    out[k] = s;
    s *= growth;
  }
}

/**
 * Diffuses c (cm⁻³ on the grid) in place by a spatially uniform D whose time integral
 * is dtCm2 = ∫D dt (cm²): exact in Dt for any temperature history when D does not
 * depend on concentration.
 */
export function diffuseUniform(
  c: Float64Array,
  grid: FdGrid,
  dtCm2: number,
  surface: SurfaceCondition,
  ws: FdWorkspace,
  steps: number = DEFAULT_TIME_STEPS,
): void {
  if (surface.kind === 'fixed') c[0] = surface.valueCm3;
  if (!(dtCm2 > 0)) return;
  const sizes = new Float64Array(steps);
  stepSizes(dtCm2, steps, sizes);
  for (let k = 0; k < steps; k++) {
    for (let i = 0; i < grid.n - 1; i++) ws.faceK[i] = sizes[k] / grid.spacingCm[i];
    thetaStep(c, grid, k < IMPLICIT_START_STEPS ? 1 : 0.5, surface, ws);
  }
}

/** One species for the concentration-dependent solver. */
export interface CoupledSpecies {
  c: Float64Array;
  /** +1 donor, −1 acceptor. */
  sign: 1 | -1;
  surface: SurfaceCondition;
  /** Diffusivity at temperature T (°C) and electron concentration n (cm⁻³), cm²/s. */
  diffusivity: (tempC: number, electronsCm3: number) => number;
}

/** A time segment of a furnace step: linear temperature from t0C to t1C over durationS. */
export interface TemperatureSegment {
  t0C: number;
  t1C: number;
  durationS: number;
  /** Sub-steps in this segment. */
  steps: number;
}

/**
 * Electron concentration from charge neutrality with full ionisation:
 * n = N/2 + √((N/2)² + nᵢ²), N = N_D − N_A (cm⁻³). Written to avoid cancellation for N ≪ 0.
 */
function electronsFromNet(netDonorsCm3: number, niCm3: number): number {
  const half = 0.5 * netDonorsCm3;
  const root = Math.sqrt(half * half + niCm3 * niCm3);
  return half >= 0 ? half + root : (niCm3 * niCm3) / (root - half);
}

/**
 * Concentration-dependent diffusion of several species through a temperature history:
 * D of each species at each node from the local electron concentration (charge
 * neutrality with the background and all species), lagged one sub-step (linearised),
 * face values by the arithmetic mean. Backward Euler throughout (robust for strongly
 * varying D); callers converge by the step count.
 */
export function diffuseCoupled(
  species: CoupledSpecies[],
  backgroundNetCm3: number,
  grid: FdGrid,
  segments: TemperatureSegment[],
  intrinsicCarriers: (tempC: number) => number,
  ws: FdWorkspace,
): void {
  const n = grid.n;
  const electrons = new Float64Array(n);
  const nodeD = new Float64Array(n);
  for (const sp of species) if (sp.surface.kind === 'fixed') sp.c[0] = sp.surface.valueCm3;
  for (const seg of segments) {
    if (!(seg.durationS > 0) || seg.steps < 1) continue;
    const sizes = new Float64Array(seg.steps);
    stepSizes(seg.durationS, seg.steps, sizes);
    let elapsed = 0;
    for (let k = 0; k < seg.steps; k++) {
      const dt = sizes[k];
      const tempC = seg.t0C + ((seg.t1C - seg.t0C) * (elapsed + 0.5 * dt)) / seg.durationS;
      elapsed += dt;
      const ni = intrinsicCarriers(tempC);
      for (let i = 0; i < n; i++) {
        let net = backgroundNetCm3;
        for (const sp of species) net += sp.sign * sp.c[i];
        electrons[i] = electronsFromNet(net, ni);
      }
      for (const sp of species) {
        for (let i = 0; i < n; i++) nodeD[i] = sp.diffusivity(tempC, electrons[i]);
        for (let i = 0; i < n - 1; i++) ws.faceK[i] = (dt * 0.5 * (nodeD[i] + nodeD[i + 1])) / grid.spacingCm[i];
        thetaStep(sp.c, grid, 1, sp.surface, ws);
      }
    }
  }
}

/** Index i of the grid cell [xᵢ, xᵢ₊₁] holding x (clamped to the grid). */
export function cellIndex(grid: FdGrid, xCm: number): number {
  if (xCm <= 0) return 0;
  if (xCm >= grid.depthCm) return grid.n - 2;
  let i = Math.floor(Math.log1p((xCm * (grid.ratio - 1)) / grid.firstSpacingCm) / Math.log(grid.ratio));
  if (i < 0) i = 0;
  if (i > grid.n - 2) i = grid.n - 2;
  while (i > 0 && grid.xCm[i] > xCm) i--;
  while (i < grid.n - 2 && grid.xCm[i + 1] < xCm) i++;
  return i;
}

/**
 * Value of a nodal profile at x: log-linear between two positive nodes (exact for an
 * exponential tail), linear otherwise; 0 beyond the grid.
 */
export function interpolateProfile(c: Float64Array, grid: FdGrid, xCm: number): number {
  if (xCm > grid.depthCm) return 0;
  const i = cellIndex(grid, xCm);
  const a = c[i];
  const b = c[i + 1];
  const f = (xCm - grid.xCm[i]) / grid.spacingCm[i];
  if (a > 0 && b > 0) return a * Math.pow(b / a, f);
  return a + (b - a) * f;
}

/**
 * Moves the surface down by deltaCm (silicon consumed by oxidation): C_new(x) = C_old(x + δ).
 * Returns the dose that was in the consumed layer, cm⁻².
 */
export function shiftProfile(c: Float64Array, grid: FdGrid, deltaCm: number, ws: FdWorkspace): number {
  if (!(deltaCm > 0)) return 0;
  const before = gridDose(c, grid);
  const tmp = ws.scratch;
  for (let i = 0; i < grid.n; i++) tmp[i] = interpolateProfile(c, grid, grid.xCm[i] + deltaCm);
  c.set(tmp);
  return Math.max(0, before - gridDose(c, grid));
}
