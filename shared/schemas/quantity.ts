// Quantities with units for recipe fields. Numbers (the forms' case) need
// nothing more; strings with units are read by mathjs through unit-reader.ts,
// which the server and the command line load at start and the browser loads
// only when it needs it (a JSON import, a unit typed into a field), so the
// workspace does not carry mathjs up front.
import { z } from 'zod';

/** Converts "value unit" text to a number in `unit`; null when the text has a unit but no number. Throws when unreadable. */
export type UnitReader = (text: string, unit: string) => number | null;

let unitReader: UnitReader | null = null;

/** Installs the reader for strings with units (see unit-reader.ts). */
export function installUnitReader(reader: UnitReader): void {
  unitReader = reader;
}

/** What a recipe field measures, its canonical unit (mathjs spelling) and how to show it. */
export interface QuantityKind {
  /** mathjs unit the number is converted to, e.g. 'degC', 'min', 'cm^-3'. */
  unit: string;
  /** The unit as people write it, e.g. '°C', 'cm⁻³'. */
  display: string;
  /** Noun for messages: 'a temperature', 'a time'. */
  noun: string;
  /** An example string that parses, for messages. */
  example: string;
}

export const QUANTITY_KINDS = {
  temperature: { unit: 'degC', display: '°C', noun: 'a temperature', example: '1050 degC' },
  time: { unit: 'min', display: 'min', noun: 'a time', example: '30 min' },
  length: { unit: 'um', display: 'µm', noun: 'a length', example: '0.1 um' },
  dose: { unit: 'cm^-2', display: 'cm⁻²', noun: 'an areal dose', example: '5e15 cm^-2' },
  energy: { unit: 'keV', display: 'keV', noun: 'an energy', example: '40 keV' },
  concentration: { unit: 'cm^-3', display: 'cm⁻³', noun: 'a concentration', example: '1e19 cm^-3' },
  resistivity: { unit: 'ohm cm', display: 'Ω·cm', noun: 'a resistivity', example: '10 ohm cm' },
  rampRate: { unit: 'degC/min', display: '°C/min', noun: 'a ramp rate', example: '10 degC/min' },
} as const satisfies Record<string, QuantityKind>;

export type QuantityKindName = keyof typeof QUANTITY_KINDS;

const SUPERSCRIPTS: Record<string, string> = {
  '⁻': '-', '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9',
};

/**
 * Rewrites what engineers type into what mathjs reads: µ/μ → u, °C/℃ → degC,
 * Ω → ohm, '·' → space, superscripts → ^n, and 'cm-3' → 'cm^-3'.
 */
export function normaliseUnitText(text: string): string {
  const [, num = '', rest = ''] = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)?\s*(.*)$/s.exec(text) ?? [];
  let unit = rest
    .replace(/[µμ]/g, 'u')
    .replace(/°\s*C|℃/g, 'degC')
    .replace(/°\s*F|℉/g, 'degF')
    .replace(/Ω/g, 'ohm')
    .replace(/[·⋅×]/g, ' ')
    .replace(/([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)/g, (s) => '^' + [...s].map((c) => SUPERSCRIPTS[c]).join(''))
    .replace(/([A-Za-z])(-\d+)(?![\d.])/g, '$1^$2')
    .trim();
  // A bare 'C' after a number is coulombs to mathjs; in a furnace recipe it means °C.
  if (unit === 'C') unit = 'degC';
  if (unit === 'K/min' || unit === 'C/min') unit = 'degC/min';
  return unit ? `${num} ${unit}`.trim() : num;
}

export type QuantityParse = { ok: true; value: number } | { ok: false; message: string };

/**
 * Reads a number (already in the canonical unit) or a string with units and returns the
 * value in the kind's canonical unit, or a human message saying what went wrong.
 */
export function parseQuantity(input: unknown, kind: QuantityKind, label: string): QuantityParse {
  if (typeof input === 'number') {
    return Number.isFinite(input) ? { ok: true, value: input } : { ok: false, message: `${label} must be a finite number` };
  }
  if (typeof input !== 'string') {
    return { ok: false, message: `${label} must be a number in ${kind.display} or a quantity such as "${kind.example}"` };
  }
  const text = normaliseUnitText(input);
  if (text === '') return { ok: false, message: `Enter ${label.toLowerCase()}` };
  if (/^[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?$/.test(text)) return { ok: true, value: Number(text) };
  if (!unitReader) {
    return { ok: false, message: `${label}: units are still loading; enter a number in ${kind.display} or try again in a moment` };
  }
  let value: number;
  try {
    const read = unitReader(text, kind.unit);
    if (read === null) {
      return { ok: false, message: `${label}: "${input}" has a unit but no number` };
    }
    value = read;
  } catch {
    return {
      ok: false,
      message: `${label}: could not read "${input}" as ${kind.noun}; use a number in ${kind.display} or write e.g. "${kind.example}"`,
    };
  }
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: `${label} must be a finite number` };
}

function formatBound(x: number): string {
  if (x !== 0 && (Math.abs(x) >= 1e5 || Math.abs(x) < 1e-3)) return x.toExponential().replace('e+', 'e');
  return String(x);
}

export interface QuantityFieldSpec {
  /** Field name in messages, sentence case: 'Temperature'. */
  label: string;
  min: number;
  max: number;
  /** True when the lower bound itself is not allowed (e.g. time > 0). */
  minExclusive?: boolean;
}

/**
 * A zod field taking a number in the kind's canonical unit or a string with units,
 * producing a number in the canonical unit checked against [min, max].
 */
export function quantityField(kindName: QuantityKindName, spec: QuantityFieldSpec) {
  const kind = QUANTITY_KINDS[kindName];
  const range = `${spec.label} must be between ${formatBound(spec.min)} and ${formatBound(spec.max)} ${kind.display}`;
  return z
    .union([z.number(), z.string()], {
      error: (iss) =>
        iss.input === undefined
          ? `Enter ${spec.label.toLowerCase()}`
          : `${spec.label} must be a number in ${kind.display} or a quantity such as "${kind.example}"`,
    })
    .transform((input, ctx) => {
      const parsed = parseQuantity(input, kind, spec.label);
      if (!parsed.ok) {
        ctx.addIssue({ code: 'custom', message: parsed.message });
        return z.NEVER;
      }
      const v = parsed.value;
      if (v > spec.max || v < spec.min || (spec.minExclusive && v === spec.min)) {
        ctx.addIssue({
          code: 'custom',
          message: spec.minExclusive ? `${range} (more than ${formatBound(spec.min)})` : range,
        });
        return z.NEVER;
      }
      return v;
    });
}
