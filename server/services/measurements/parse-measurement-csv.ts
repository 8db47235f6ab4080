// Reads an uploaded measurement CSV. Every row is checked; one bad row makes
// the whole file rejected (nothing is stored), with the file's line numbers.
// Format: shared/schemas/measurements.md.
import { parse } from 'csv-parse/sync';
import type { ApiIssue } from '../../../shared/schemas/api';
import {
  CONCENTRATION_UNITS,
  DEPTH_UNITS,
  SHEET_UNITS,
  UPLOAD_LIMITS,
  type ConcentrationUnit,
  type DepthUnit,
  type ProfilePoints,
  type SheetPoints,
  type SheetUnit,
} from '../../../shared/schemas/measurements';

const TO_UM: Record<DepthUnit, number> = { um: 1, nm: 1e-3, cm: 1e4 };
const TO_CM3: Record<ConcentrationUnit, number> = { 'cm^-3': 1, 'm^-3': 1e-6 };
const TO_OHM_SQ: Record<SheetUnit, number> = { 'ohm/sq': 1, 'kohm/sq': 1e3, 'mohm/sq': 1e-3 };
const MAX_ISSUES = 50;

export type Parsed<T> = { ok: true; points: T; units: Record<string, string>; declared: Record<string, string> } | { ok: false; issues: ApiIssue[] };

/** Spellings people use for the same unit, folded to ours. */
function normaliseUnit(raw: string): string {
  return raw
    .trim()
    .toLowerCase()
    .replace(/µ|μ/g, 'u')
    .replace(/\s+/g, '')
    .replace(/^atoms\/cm(\^?3|³)$/, 'cm^-3')
    .replace(/^cm-3$|^cm⁻³$|^1\/cm\^?3$|^\/cm\^?3$/, 'cm^-3')
    .replace(/^m-3$|^m⁻³$/, 'm^-3')
    .replace(/^(ohm|ω)\/(sq|□)$|^ohms\/sq$|^ohm\/square$/, 'ohm/sq')
    .replace(/^kohm\/(sq|□)$|^kω\/(sq|□)$/, 'kohm/sq')
    .replace(/^mohm\/(sq|□)$|^mω\/(sq|□)$/, 'mohm/sq')
    .replace(/^microns?$|^um$/, 'um');
}

const issue = (line: number, message: string): ApiIssue => ({ path: `file.line.${line}`, message: `Line ${line}: ${message}` });

interface Table {
  header: string[];
  headerUnits: (string | undefined)[];
  declared: Record<string, string>;
  rows: { line: number; cells: string[] }[];
}

/** Splits declarations (`# key: value`), the header row (names with optional `(unit)`) and data rows. */
function readTable(text: string): { ok: true; table: Table } | { ok: false; issues: ApiIssue[] } {
  if (text.includes('\u0000')) return { ok: false, issues: [issue(1, 'this is not a text file')] };
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const declared: Record<string, string> = {};
  let first = 0;
  while (first < lines.length && (lines[first].trim() === '' || lines[first].trim().startsWith('#'))) {
    const m = /^#\s*([a-z_ ]+?)\s*[:=]\s*(.+)$/i.exec(lines[first].trim());
    if (m) declared[m[1].toLowerCase().replace(/\s+/g, '_')] = m[2].trim();
    first++;
  }
  if (first >= lines.length) return { ok: false, issues: [issue(1, 'the file has no header row and no data')] };
  let records: { record: string[]; info: { lines: number } }[];
  try {
    records = parse(lines.slice(first).join('\n'), {
      info: true,
      comment: '#',
      skip_empty_lines: true,
      trim: true,
      relax_column_count: true,
    }) as unknown as { record: string[]; info: { lines: number } }[];
  } catch (e) {
    const line = (e as { lines?: number }).lines;
    return { ok: false, issues: [issue((line ?? 1) + first, `the CSV cannot be read (${(e as Error).message.replace(/^.*?: /, '')})`)] };
  }
  if (records.length === 0) return { ok: false, issues: [issue(first + 1, 'the file has no header row')] };
  const [head, ...body] = records;
  const header: string[] = [];
  const headerUnits: (string | undefined)[] = [];
  for (const cell of head.record) {
    const m = /^([^([]+?)\s*(?:[([]\s*(.+?)\s*[)\]])?$/.exec(cell);
    header.push((m?.[1] ?? cell).trim().toLowerCase().replace(/\s+/g, '_'));
    headerUnits.push(m?.[2]);
  }
  return { ok: true, table: { header, headerUnits, declared, rows: body.map((r) => ({ line: r.info.lines + first, cells: r.record })) } };
}

function findColumn(t: Table, names: string[]): number {
  return t.header.findIndex((h) => names.includes(h));
}

/** The unit of a column: the file (header or declaration) wins, else the form's choice. */
function unitOf<U extends string>(t: Table, col: number, declKeys: string[], allowed: readonly U[], fromForm: U | undefined, what: string, headerLine: number): { unit?: U; issue?: ApiIssue } {
  const inFile = t.headerUnits[col] ?? declKeys.map((k) => t.declared[k]).find(Boolean);
  if (inFile !== undefined) {
    const u = normaliseUnit(inFile) as U;
    if (!allowed.includes(u)) return { issue: issue(headerLine, `the ${what} unit "${inFile}" is not one of ${allowed.join(', ')}`) };
    if (fromForm && fromForm !== u) return { issue: issue(headerLine, `the file says ${what} is in ${u} but the form says ${fromForm}; make them agree`) };
    return { unit: u };
  }
  if (fromForm) return { unit: fromForm };
  return { issue: issue(headerLine, `no ${what} unit: declare it in the header, e.g. "${what} (${allowed[0]})", or choose it in the form`) };
}

function number(cell: string | undefined): number | null {
  if (cell === undefined || cell.trim() === '') return null;
  const x = Number(cell.trim());
  return Number.isFinite(x) ? x : null;
}

function headerLineOf(t: Table): number {
  return (t.rows[0]?.line ?? 2) - 1;
}

/** Depth–concentration profile (SIMS, spreading resistance). */
export function parseProfileCsv(text: string, form: { depthUnit?: DepthUnit; concentrationUnit?: ConcentrationUnit }): Parsed<ProfilePoints> {
  const read = readTable(text);
  if (!read.ok) return read;
  const t = read.table;
  const hl = headerLineOf(t);
  const dCol = findColumn(t, ['depth', 'x', 'depth_um', 'depth_nm']);
  const cCol = findColumn(t, ['concentration', 'conc', 'c', 'n']);
  if (dCol < 0 || cCol < 0) return { ok: false, issues: [issue(hl, 'the header must name the columns depth and concentration')] };
  const du = unitOf(t, dCol, ['depth_unit'], DEPTH_UNITS, form.depthUnit, 'depth', hl);
  const cu = unitOf(t, cCol, ['concentration_unit'], CONCENTRATION_UNITS, form.concentrationUnit, 'concentration', hl);
  const issues = [du.issue, cu.issue].filter((i): i is ApiIssue => Boolean(i));
  if (t.rows.length === 0) issues.push(issue(hl + 1, 'the file has a header but no data rows'));
  if (t.rows.length > UPLOAD_LIMITS.maxRows) issues.push(issue(hl, `at most ${UPLOAD_LIMITS.maxRows} rows (the file has ${t.rows.length})`));
  if (issues.length) return { ok: false, issues };
  const depthUm: number[] = [];
  const concentrationCm3: number[] = [];
  let lastDepthUm = -Infinity;
  for (const { line, cells } of t.rows) {
    if (issues.length >= MAX_ISSUES) break;
    if (cells.length !== t.header.length) {
      issues.push(issue(line, `expected ${t.header.length} columns, found ${cells.length}`));
      continue;
    }
    const d = number(cells[dCol]);
    const c = number(cells[cCol]);
    const dUm = d === null || d < 0 ? null : d * TO_UM[du.unit!];
    if (dUm === null) issues.push(issue(line, `depth "${cells[dCol]}" must be a number ≥ 0`));
    else if (dUm <= lastDepthUm) issues.push(issue(line, `depths must increase from row to row (${cells[dCol]} after a deeper one)`));
    if (c === null || c < 0) issues.push(issue(line, `concentration "${cells[cCol]}" must be a number ≥ 0`));
    if (dUm === null) continue;
    const ordered = dUm > lastDepthUm;
    lastDepthUm = Math.max(lastDepthUm, dUm);
    if (c === null || c < 0 || !ordered) continue;
    depthUm.push(dUm);
    concentrationCm3.push(c * TO_CM3[cu.unit!]);
  }
  if (issues.length) return { ok: false, issues };
  if (depthUm.length < 3) return { ok: false, issues: [issue(hl + 1, 'a profile needs at least 3 points')] };
  return { ok: true, points: { depthUm, concentrationCm3 }, units: { depth: du.unit!, concentration: cu.unit! }, declared: t.declared };
}

/** Four-point-probe readings: site label and sheet resistance. */
export function parseSheetCsv(text: string, form: { sheetUnit?: SheetUnit }): Parsed<SheetPoints> {
  const read = readTable(text);
  if (!read.ok) return read;
  const t = read.table;
  const hl = headerLineOf(t);
  const sCol = findColumn(t, ['site', 'position', 'location']);
  const rCol = findColumn(t, ['sheet_resistance', 'rs', 'rsheet', 'value']);
  if (sCol < 0 || rCol < 0) return { ok: false, issues: [issue(hl, 'the header must name the columns site and sheet_resistance')] };
  const ru = unitOf(t, rCol, ['sheet_resistance_unit', 'unit'], SHEET_UNITS, form.sheetUnit, 'sheet_resistance', hl);
  const issues = ru.issue ? [ru.issue] : [];
  if (t.rows.length === 0) issues.push(issue(hl + 1, 'the file has a header but no data rows'));
  if (t.rows.length > UPLOAD_LIMITS.maxRows) issues.push(issue(hl, `at most ${UPLOAD_LIMITS.maxRows} rows`));
  if (issues.length) return { ok: false, issues };
  const sites: string[] = [];
  const ohmSq: number[] = [];
  const seen = new Set<string>();
  for (const { line, cells } of t.rows) {
    if (issues.length >= MAX_ISSUES) break;
    if (cells.length !== t.header.length) {
      issues.push(issue(line, `expected ${t.header.length} columns, found ${cells.length}`));
      continue;
    }
    const site = cells[sCol].trim();
    const r = number(cells[rCol]);
    if (!site || site.length > 40) issues.push(issue(line, 'site must be a label of 1–40 characters'));
    else if (seen.has(site)) issues.push(issue(line, `site "${site}" appears twice`));
    if (r === null || r <= 0) issues.push(issue(line, `sheet resistance "${cells[rCol]}" must be a number > 0`));
    if (!site || site.length > 40 || seen.has(site) || r === null || r <= 0) continue;
    seen.add(site);
    sites.push(site);
    ohmSq.push(r * TO_OHM_SQ[ru.unit!]);
  }
  if (issues.length) return { ok: false, issues };
  return { ok: true, points: { sites, ohmSq }, units: { sheet_resistance: ru.unit! }, declared: t.declared };
}
