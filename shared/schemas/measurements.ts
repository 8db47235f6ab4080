// Measured results against a lot: uploaded CSV files (depth profiles from SIMS
// or spreading resistance, four-point-probe sheet resistances), what was
// derived from them, and per-tube calibration. File format: measurements.md.
import { z } from 'zod';

export const MEASUREMENT_KINDS = ['profile', 'sheet_resistance'] as const;
export type MeasurementKind = (typeof MEASUREMENT_KINDS)[number];

export const PROFILE_METHODS = ['SIMS', 'spreading resistance'] as const;
export const DEPTH_UNITS = ['um', 'nm', 'cm'] as const;
export const CONCENTRATION_UNITS = ['cm^-3', 'm^-3'] as const;
export const SHEET_UNITS = ['ohm/sq', 'kohm/sq', 'mohm/sq'] as const;
export type DepthUnit = (typeof DEPTH_UNITS)[number];
export type ConcentrationUnit = (typeof CONCENTRATION_UNITS)[number];
export type SheetUnit = (typeof SHEET_UNITS)[number];

/** Limits of an upload (a real SIMS depth profile has a few thousand points). */
export const UPLOAD_LIMITS = { maxBytes: 2 * 1024 * 1024, maxRows: 20_000 } as const;

/** The form fields sent beside the file (multipart). Units in the file header win when present. */
export const uploadFieldsSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('profile'),
    method: z.enum(PROFILE_METHODS, { error: 'Choose SIMS or spreading resistance' }).default('SIMS'),
    depthUnit: z.enum(DEPTH_UNITS, { error: 'Depth unit must be um, nm or cm' }).optional(),
    concentrationUnit: z.enum(CONCENTRATION_UNITS, { error: 'Concentration unit must be cm^-3 or m^-3' }).optional(),
    notes: z.string().trim().max(2000).default(''),
  }),
  z.object({
    kind: z.literal('sheet_resistance'),
    method: z.literal('four-point probe').default('four-point probe'),
    sheetUnit: z.enum(SHEET_UNITS, { error: 'Sheet resistance unit must be ohm/sq, kohm/sq or mohm/sq' }).optional(),
    notes: z.string().trim().max(2000).default(''),
  }),
], { error: 'Kind must be profile or sheet_resistance' });
export type UploadFields = z.input<typeof uploadFieldsSchema>;

export interface ProfilePoints {
  depthUm: number[];
  concentrationCm3: number[];
}

export interface SheetPoints {
  sites: string[];
  ohmSq: number[];
}

export interface ProfileSummary {
  /** The dopant the file says it measured (`# species: B`), when it names one of ours. */
  species?: 'B' | 'P' | 'As' | 'Sb';
  /** Depths where the measured concentration crosses the substrate background, µm. */
  junctionDepthsUm: number[];
  surfaceConcentrationCm3: number;
  peakConcentrationCm3: number;
  /** ∫C dx over the measured depth, cm⁻². */
  doseCm2: number;
  points: number;
  maxDepthUm: number;
}

export interface SheetSummary {
  meanOhmSq: number;
  stdDevOhmSq: number;
  minOhmSq: number;
  maxOhmSq: number;
  /** (max − min) / (2 · mean), a usual uniformity figure (common practice). */
  nonUniformityPct: number;
  sites: number;
}

export interface Measurement {
  id: number;
  lotId: number;
  kind: MeasurementKind;
  method: string;
  fileName: string;
  notes: string;
  points: ProfilePoints | SheetPoints;
  summary: ProfileSummary | SheetSummary;
  uploadedBy: { id: number; name: string };
  createdAt: string;
}

/** Measured against predicted, for a lot. Differences are measured − predicted. */
export interface LotComparison {
  predicted: { junctionDepthUm: number | null; sheetResistanceOhmSq: number | null; surfaceConcentrationCm3: number };
  measured: { junctionDepthUm: number | null; sheetResistanceOhmSq: number | null };
  delta: { junctionDepthUm: number | null; junctionDepthPct: number | null; sheetResistanceOhmSq: number | null; sheetResistancePct: number | null };
}

export const fitCalibrationSchema = z.object({ note: z.string().trim().max(2000).default('') });

export interface CalibrationPoint {
  lotId: number;
  lotCode: string;
  versionId: number;
  measuredUm: number;
  predictedUm: number;
  correctedUm: number;
}

export interface Calibration {
  id: number;
  tubeId: number;
  factor: number;
  /** 1-sigma range of the factor from the fit, [low, high]. */
  factorRange: [number, number];
  rmsLogErrorBefore: number;
  rmsLogErrorAfter: number;
  points: number;
  data: CalibrationPoint[];
  note: string;
  fittedBy: { id: number; name: string };
  createdAt: string;
}
