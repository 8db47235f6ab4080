// What the browser can tell about a measurement CSV before sending it: whether
// it is small enough and named like a CSV, and which units its header already
// declares (so the form asks only for the missing ones; the file's header wins
// on the server). The server parses the whole file authoritatively.
import type { ApiIssue } from '../../../shared/schemas/api';
import {
  UPLOAD_LIMITS,
  type ConcentrationUnit,
  type DepthUnit,
  type MeasurementKind,
  type SheetUnit,
  type UploadFields,
} from '../../../shared/schemas/measurements';

/** Tiny examples of the two formats (see shared/schemas/measurements.md). */
export const PROFILE_EXAMPLE = '# species: B\ndepth (nm),concentration (cm^-3)\n0,1.2e20\n50,3.1e19\n100,2.4e18\n150,8.0e16\n';
export const SHEET_EXAMPLE = 'site,sheet_resistance (ohm/sq)\nC,101.2\nN,99.8\nE,102.5\nS,100.9\nW,98.7\n';

export type UnitField = 'depth' | 'concentration' | 'sheet';

/** Units the file states for itself, as written (null: the file does not say). */
export type DeclaredUnits = Record<UnitField, string | null>;

const COLUMNS: Record<UnitField, { names: string[]; declared: string[] }> = {
  depth: { names: ['depth', 'x', 'depth_um', 'depth_nm'], declared: ['depth_unit'] },
  concentration: { names: ['concentration', 'conc', 'c', 'n'], declared: ['concentration_unit'] },
  sheet: { names: ['sheet_resistance', 'rs', 'rsheet', 'value'], declared: ['sheet_resistance_unit', 'unit'] },
};

/** Reads the `# key: value` declarations and the header row (`name (unit)` cells) of a CSV's first lines. */
export function declaredUnits(text: string): DeclaredUnits {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const declared: Record<string, string> = {};
  let i = 0;
  for (; i < lines.length; i++) {
    const line = lines[i].trim();
    if (line !== '' && !line.startsWith('#')) break;
    const m = /^#\s*([a-z_ ]+?)\s*[:=]\s*(.+)$/i.exec(line);
    if (m) declared[m[1].toLowerCase().replace(/\s+/g, '_')] = m[2].trim();
  }
  const header = (lines[i] ?? '').split(',').map((cell) => {
    const m = /^([^([]+?)\s*(?:[([]\s*(.+?)\s*[)\]])?$/.exec(cell.trim().replace(/^"|"$/g, ''));
    return { name: (m?.[1] ?? cell).trim().toLowerCase().replace(/\s+/g, '_'), unit: m?.[2] ?? null };
  });
  const unitOf = (field: UnitField): string | null => {
    const column = header.find((h) => COLUMNS[field].names.includes(h.name));
    return column?.unit ?? COLUMNS[field].declared.map((k) => declared[k]).find(Boolean) ?? null;
  };
  return { depth: unitOf('depth'), concentration: unitOf('concentration'), sheet: unitOf('sheet') };
}

/** The unit fields of a kind of file. */
export const UNIT_FIELDS: Record<MeasurementKind, UnitField[]> = { profile: ['depth', 'concentration'], sheet_resistance: ['sheet'] };

/** Unit fields the form must ask for: those the file does not declare (all of them before a file is read). */
export function unitsToAsk(kind: MeasurementKind, declared: DeclaredUnits | null): UnitField[] {
  return UNIT_FIELDS[kind].filter((f) => declared === null || declared[f] === null);
}

/** Why a chosen file cannot be sent, or null when it may go. Mirrors the server's size and type checks. */
export function precheckFile(file: { name: string; size: number }): string | null {
  if (!/\.(csv|txt)$/i.test(file.name)) return `${file.name} is not a CSV file: choose a .csv file.`;
  if (file.size === 0) return `${file.name} is empty.`;
  if (file.size > UPLOAD_LIMITS.maxBytes) {
    const mb = (file.size / (1024 * 1024)).toFixed(1);
    return `${file.name} is ${mb} MB; the limit is ${UPLOAD_LIMITS.maxBytes / (1024 * 1024)} MB.`;
  }
  return null;
}

export interface UnitChoice {
  depthUnit: DepthUnit;
  concentrationUnit: ConcentrationUnit;
  sheetUnit: SheetUnit;
}

/** The form fields sent beside the file: a unit only where the form asked for it, so it never contradicts the file. */
export function uploadFields(kind: MeasurementKind, method: string, units: UnitChoice, ask: UnitField[], notes: string): UploadFields {
  const trimmed = notes.trim();
  if (kind === 'sheet_resistance') {
    return { kind, method: 'four-point probe', notes: trimmed, ...(ask.includes('sheet') ? { sheetUnit: units.sheetUnit } : {}) };
  }
  return {
    kind,
    method: method as 'SIMS' | 'spreading resistance',
    notes: trimmed,
    ...(ask.includes('depth') ? { depthUnit: units.depthUnit } : {}),
    ...(ask.includes('concentration') ? { concentrationUnit: units.concentrationUnit } : {}),
  };
}

export interface LineIssue {
  /** The file's line number, or null for a problem with the file as a whole. */
  line: number | null;
  message: string;
}

/** The server's `file.line.N` issues as rows of line → message (the "Line N: " prefix dropped). */
export function lineIssues(issues: ApiIssue[]): LineIssue[] {
  return issues.map((i) => {
    const m = /^file\.line\.(\d+)$/.exec(i.path);
    return m ? { line: Number(m[1]), message: i.message.replace(/^Line \d+:\s*/, '') } : { line: null, message: i.message };
  });
}
