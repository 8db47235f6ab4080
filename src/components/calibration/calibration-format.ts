// How a calibration reads on screen. The fit's quality is the RMS of
// ln(measured / predicted) junction depth; × 100 it reads as a percentage
// (for small values, about the typical relative error).
import type { Calibration } from '../../../shared/schemas/measurements';
import { formatSig } from '../recipe/recipe-format';

/** '× 1.179' */
export const formatFactor = (f: number | null | undefined) => (f === null || f === undefined || !Number.isFinite(f) ? '—' : `× ${formatSig(f, 4)}`);

/** RMS of ln(measured/predicted) as a percentage: 0.0812 → '8.1 %'. */
export const rmsPct = (rms: number | null | undefined) => (rms === null || rms === undefined || !Number.isFinite(rms) ? '—' : `${(rms * 100).toFixed(1)} %`);

/** '8.1 % → 2.3 %' */
export const qualityText = (c: Pick<Calibration, 'rmsLogErrorBefore' | 'rmsLogErrorAfter'>) => `${rmsPct(c.rmsLogErrorBefore)} → ${rmsPct(c.rmsLogErrorAfter)}`;

/** The 1σ range of the factor: '1.142 – 1.217'. */
export const rangeText = ([lo, hi]: [number, number]) => `${formatSig(lo, 4)} – ${formatSig(hi, 4)}`;

/** The junction-depth change the factor makes at a fixed Dt: xj scales with √D, so √f − 1 (a rule of thumb for a single diffusion). */
export const xjShiftPct = (f: number) => (Math.sqrt(f) - 1) * 100;
