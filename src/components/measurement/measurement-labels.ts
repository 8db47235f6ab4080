// Labels for the measurement form's choices; values are the API's.
import { CONCENTRATION_UNITS, DEPTH_UNITS, PROFILE_METHODS, SHEET_UNITS, type MeasurementKind } from '../../../shared/schemas/measurements';
import type { UnitField } from './measurement-csv';

export const KIND_OPTIONS: { value: MeasurementKind; label: string }[] = [
  { value: 'profile', label: 'Depth profile' },
  { value: 'sheet_resistance', label: 'Sheet resistance (four-point probe)' },
];

export const KIND_LABEL: Record<MeasurementKind, string> = { profile: 'Profile', sheet_resistance: 'Sheet resistance' };

export const METHOD_OPTIONS = PROFILE_METHODS.map((m) => ({ value: m, label: m === 'SIMS' ? 'SIMS' : 'Spreading resistance' }));

const UNIT_TEXT: Record<string, string> = { um: 'µm', nm: 'nm', cm: 'cm', 'cm^-3': 'cm⁻³', 'm^-3': 'm⁻³', 'ohm/sq': 'Ω/□', 'kohm/sq': 'kΩ/□', 'mohm/sq': 'mΩ/□' };

/** How a unit reads on screen: µm, cm⁻³, Ω/□ (unknown spellings as written). */
export const unitText = (u: string) => UNIT_TEXT[u] ?? u;

export const UNIT_OPTIONS: Record<UnitField, { value: string; label: string }[]> = {
  depth: DEPTH_UNITS.map((u) => ({ value: u, label: unitText(u) })),
  concentration: CONCENTRATION_UNITS.map((u) => ({ value: u, label: unitText(u) })),
  sheet: SHEET_UNITS.map((u) => ({ value: u, label: unitText(u) })),
};

export const UNIT_FIELD_LABEL: Record<UnitField, string> = { depth: 'Depth unit', concentration: 'Concentration unit', sheet: 'Sheet resistance unit' };
export const UNIT_KEY = { depth: 'depthUnit', concentration: 'concentrationUnit', sheet: 'sheetUnit' } as const;
