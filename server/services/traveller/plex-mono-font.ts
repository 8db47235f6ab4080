/// <reference types="pdfkit" />
// IBM Plex Mono for pdfkit, taken from the app's own @fontsource package.
// pdfkit's font parser crashes on the shipped WOFF1 files and draws blank glyphs
// from the WOFF2 ones, so the WOFF1 file is unwrapped into a plain TrueType (sfnt)
// buffer in memory: no extra dependency, nothing fetched at run time.
import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { inflateSync } from 'node:zlib';

export type PlexWeight = 'regular' | 'semibold';

/** Names under which `registerPlexMono` registers the faces on a pdfkit document. */
export const PLEX_FONT = { regular: 'PlexMono', semibold: 'PlexMono-SemiBold' } as const;

// The latin subset holds U+0000–00FF (°, µ, ², ³, ±, ·, ×), U+2000–206F (—, –, …)
// and U+2212 (minus). Greek (Ω, μ) and most superscripts (⁻, ⁴–⁹) are in no
// subset the package ships, so `fitToPlex` spells them out instead.
const FILES: Record<PlexWeight, string> = {
  regular: '@fontsource/ibm-plex-mono/files/ibm-plex-mono-latin-400-normal.woff',
  semibold: '@fontsource/ibm-plex-mono/files/ibm-plex-mono-latin-600-normal.woff',
};

const WOFF_SIGNATURE = 0x774f4646; // 'wOFF'
const WOFF_HEADER_BYTES = 44;
const WOFF_TABLE_ENTRY_BYTES = 20;
const SFNT_HEADER_BYTES = 12;
const SFNT_TABLE_RECORD_BYTES = 16;

const pad4 = (n: number): number => (n + 3) & ~3;

/** Sum of the big-endian uint32 words of a table, zero-padded to 4 bytes (the sfnt checksum). */
export function sfntChecksum(table: Buffer): number {
  let sum = 0;
  const padded = table.length % 4 === 0 ? table : Buffer.concat([table, Buffer.alloc(4 - (table.length % 4))]);
  for (let i = 0; i < padded.length; i += 4) sum = (sum + padded.readUInt32BE(i)) >>> 0;
  return sum;
}

/**
 * Unwraps a WOFF 1.0 font into the TrueType/OpenType (sfnt) bytes it carries.
 * Each table is inflated when its compressed length is below its original length
 * (that is how WOFF marks compression), then laid out 4-byte aligned behind a
 * fresh sfnt header and table directory sorted by tag.
 */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.length < WOFF_HEADER_BYTES || woff.readUInt32BE(0) !== WOFF_SIGNATURE) {
    throw new Error('not a WOFF 1.0 font (missing wOFF signature)');
  }
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  if (WOFF_HEADER_BYTES + numTables * WOFF_TABLE_ENTRY_BYTES > woff.length) {
    throw new Error('WOFF table directory runs past the end of the file');
  }

  const tables: Array<{ tag: string; data: Buffer }> = [];
  for (let i = 0; i < numTables; i++) {
    const at = WOFF_HEADER_BYTES + i * WOFF_TABLE_ENTRY_BYTES;
    const tag = woff.toString('latin1', at, at + 4);
    const offset = woff.readUInt32BE(at + 4);
    const compLength = woff.readUInt32BE(at + 8);
    const origLength = woff.readUInt32BE(at + 12);
    if (offset + compLength > woff.length) throw new Error(`WOFF table ${tag} runs past the end of the file`);
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : Buffer.from(raw);
    if (data.length !== origLength) throw new Error(`WOFF table ${tag} inflates to ${data.length} bytes, expected ${origLength}`);
    // The head checksum is taken with checkSumAdjustment zeroed (set again below).
    if (tag === 'head') data.writeUInt32BE(0, 8);
    tables.push({ tag, data });
  }
  tables.sort((a, b) => (a.tag < b.tag ? -1 : a.tag > b.tag ? 1 : 0));

  const entrySelector = Math.floor(Math.log2(numTables));
  const searchRange = 2 ** entrySelector * 16;
  const directoryBytes = SFNT_HEADER_BYTES + numTables * SFNT_TABLE_RECORD_BYTES;
  const total = tables.reduce((n, t) => n + pad4(t.data.length), directoryBytes);
  const out = Buffer.alloc(total);

  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(searchRange, 6);
  out.writeUInt16BE(entrySelector, 8);
  out.writeUInt16BE(numTables * 16 - searchRange, 10);

  let offset = directoryBytes;
  let headOffset = -1;
  tables.forEach((t, i) => {
    const rec = SFNT_HEADER_BYTES + i * SFNT_TABLE_RECORD_BYTES;
    out.write(t.tag, rec, 4, 'latin1');
    out.writeUInt32BE(sfntChecksum(t.data), rec + 4);
    out.writeUInt32BE(offset, rec + 8);
    out.writeUInt32BE(t.data.length, rec + 12);
    t.data.copy(out, offset);
    if (t.tag === 'head') headOffset = offset;
    offset += pad4(t.data.length);
  });

  // head.checkSumAdjustment makes the whole file sum to 0xB1B0AFBA; the WOFF's value
  // was for the original layout, so it is recomputed for ours.
  if (headOffset >= 0) {
    out.writeUInt32BE((0xb1b0afba - sfntChecksum(out)) >>> 0, headOffset + 8);
  }
  return out;
}

/** Tags and byte ranges of an sfnt's table directory. */
export function sfntTables(sfnt: Buffer): Map<string, { offset: number; length: number; checksum: number }> {
  const numTables = sfnt.readUInt16BE(4);
  const tables = new Map<string, { offset: number; length: number; checksum: number }>();
  for (let i = 0; i < numTables; i++) {
    const rec = SFNT_HEADER_BYTES + i * SFNT_TABLE_RECORD_BYTES;
    tables.set(sfnt.toString('latin1', rec, rec + 4), {
      checksum: sfnt.readUInt32BE(rec + 4),
      offset: sfnt.readUInt32BE(rec + 8),
      length: sfnt.readUInt32BE(rec + 12),
    });
  }
  return tables;
}

/** Code points the font maps to a glyph, read from its cmap (format 4 or 12, Windows Unicode). */
export function cmapCodePoints(sfnt: Buffer): Set<number> {
  const cmap = sfntTables(sfnt).get('cmap');
  if (!cmap) throw new Error('font has no cmap table');
  const base = cmap.offset;
  const count = sfnt.readUInt16BE(base + 2);
  const subtables: Array<{ platform: number; encoding: number; offset: number }> = [];
  for (let i = 0; i < count; i++) {
    const at = base + 4 + i * 8;
    subtables.push({ platform: sfnt.readUInt16BE(at), encoding: sfnt.readUInt16BE(at + 2), offset: base + sfnt.readUInt32BE(at + 4) });
  }
  const pick = (format: number) =>
    subtables.find((s) => (s.platform === 3 || s.platform === 0) && sfnt.readUInt16BE(s.offset) === format);

  const points = new Set<number>();
  const f12 = pick(12);
  if (f12) {
    const groups = sfnt.readUInt32BE(f12.offset + 12);
    for (let g = 0; g < groups; g++) {
      const at = f12.offset + 16 + g * 12;
      const start = sfnt.readUInt32BE(at);
      const end = sfnt.readUInt32BE(at + 4);
      for (let cp = start; cp <= end; cp++) points.add(cp);
    }
    return points;
  }
  const f4 = pick(4);
  if (!f4) throw new Error('font has no Unicode cmap subtable of format 4 or 12');
  const o = f4.offset;
  const segX2 = sfnt.readUInt16BE(o + 6);
  const ends = o + 14;
  const starts = ends + segX2 + 2;
  const deltas = starts + segX2;
  const rangeOffsets = deltas + segX2;
  for (let s = 0; s < segX2; s += 2) {
    const end = sfnt.readUInt16BE(ends + s);
    const start = sfnt.readUInt16BE(starts + s);
    const delta = sfnt.readInt16BE(deltas + s);
    const rangeOffset = sfnt.readUInt16BE(rangeOffsets + s);
    for (let cp = start; cp <= end && cp !== 0xffff; cp++) {
      let glyph: number;
      if (rangeOffset === 0) glyph = (cp + delta) & 0xffff;
      else {
        const at = rangeOffsets + s + rangeOffset + (cp - start) * 2;
        glyph = sfnt.readUInt16BE(at);
        if (glyph !== 0) glyph = (glyph + delta) & 0xffff;
      }
      if (glyph !== 0) points.add(cp);
    }
  }
  return points;
}

interface LoadedFace {
  ttf: Buffer;
  codePoints: Set<number>;
}
const cache = new Map<PlexWeight, LoadedFace>();

function face(weight: PlexWeight): LoadedFace {
  let loaded = cache.get(weight);
  if (!loaded) {
    const path = createRequire(import.meta.url).resolve(FILES[weight]);
    const ttf = woffToSfnt(readFileSync(path));
    loaded = { ttf, codePoints: cmapCodePoints(ttf) };
    cache.set(weight, loaded);
  }
  return loaded;
}

/** The TrueType bytes of one Plex Mono weight (converted once, then cached). */
export function plexMonoTtf(weight: PlexWeight = 'regular'): Buffer {
  return face(weight).ttf;
}

/** Registers both Plex Mono weights on a pdfkit document under `PLEX_FONT` names. */
export function registerPlexMono(doc: PDFKit.PDFDocument): void {
  doc.registerFont(PLEX_FONT.regular, plexMonoTtf('regular'));
  doc.registerFont(PLEX_FONT.semibold, plexMonoTtf('semibold'));
}

// Spelled-out forms for characters the shipped subset lacks, in the way lab
// notebooks write them when the glyph is missing.
const SPELLED: Record<string, string> = {
  '\u03a9': 'ohm', // Greek capital omega
  '\u2126': 'ohm', // ohm sign
  'μ': 'µ', // Greek mu → micro sign, which the latin subset has
  'Δ': 'delta ',
  'α': 'alpha',
  'β': 'beta',
  'σ': 'sigma',
  '→': '->',
  '←': '<-',
  '≤': '<=',
  '≥': '>=',
  '≈': '~',
  '√': 'sqrt',
  '∞': 'inf',
};
const SUPERSCRIPT_PLAIN: Record<string, string> = {
  '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁺': '+', '⁻': '-',
};
const SUPERSCRIPT_RUN = /[⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻]+/g;

/**
 * Rewrites text so every character has a glyph in the shipped Plex Mono subset.
 * A superscript run the font cannot draw whole becomes plain text: after a digit
 * it reads as a power (`10¹⁵` → `10^15`), after a unit as an exponent
 * (`cm⁻³` → `cm-3`, `cm²` stays). Ω becomes `ohm` (`Ω/sq` → `ohm/sq`), arrows and
 * comparison signs their ASCII forms; anything else missing is decomposed (é → e)
 * or shown as `?`.
 */
export function fitToPlex(text: string, weight: PlexWeight = 'regular'): string {
  const { codePoints } = face(weight);
  const has = (ch: string) => codePoints.has(ch.codePointAt(0)!);
  const withPowers = text.replace(SUPERSCRIPT_RUN, (run, at: number) => {
    if ([...run].every(has)) return run;
    const plain = [...run].map((c) => SUPERSCRIPT_PLAIN[c]).join('');
    return at > 0 && /\d/.test(text[at - 1]) ? `^${plain}` : plain;
  });
  const chars = [...withPowers];
  let out = '';
  for (const [i, ch] of chars.entries()) {
    if (has(ch) || ch === '\n') out += ch;
    else if (SPELLED[ch] !== undefined && [...SPELLED[ch]].every(has)) {
      // 'Δ xj' → 'delta xj', 'Δxj' → 'delta xj': one space either way.
      out += /\s/.test(chars[i + 1] ?? ' ') ? SPELLED[ch].trimEnd() : SPELLED[ch];
    } else {
      const base = ch.normalize('NFKD').replace(/[\u0300-\u036f]/g, '');
      out += base && [...base].every(has) ? base : '?';
    }
  }
  return out;
}
