import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import PDFDocument from 'pdfkit';
import {
  cmapCodePoints,
  fitToPlex,
  plexMonoTtf,
  registerPlexMono,
  PLEX_FONT,
  sfntChecksum,
  sfntTables,
  woffToSfnt,
} from '../../../../server/services/traveller/plex-mono-font';
import { pdfFonts, pdfText } from './pdf-tools';

const woffPath = createRequire(import.meta.url).resolve('@fontsource/ibm-plex-mono/files/ibm-plex-mono-latin-400-normal.woff');
const woff = readFileSync(woffPath);
const ttf = woffToSfnt(woff);

function renderWith(text: string): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4' });
  registerPlexMono(doc);
  doc.font(PLEX_FONT.regular).text(text).font(PLEX_FONT.semibold).text(text);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  return new Promise((resolve) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.end();
  });
}

describe('woffToSfnt', () => {
  // Required TrueType tables: OpenType specification 1.9, "Font tables" (required and TrueType outline tables).
  it.each(['cmap', 'head', 'hhea', 'hmtx', 'maxp', 'name', 'OS/2', 'post', 'glyf', 'loca'])('keeps the %s table', (tag) => {
    expect(sfntTables(ttf).has(tag)).toBe(true);
  });

  it('writes the header the OpenType specification prescribes for the table count', () => {
    const numTables = woff.readUInt16BE(12);
    const entrySelector = Math.floor(Math.log2(numTables));
    expect(ttf.readUInt32BE(0)).toBe(woff.readUInt32BE(4)); // sfnt version = WOFF flavor
    expect(ttf.readUInt16BE(4)).toBe(numTables);
    expect(ttf.readUInt16BE(6)).toBe(2 ** entrySelector * 16);
    expect(ttf.readUInt16BE(8)).toBe(entrySelector);
    expect(ttf.readUInt16BE(10)).toBe(numTables * 16 - 2 ** entrySelector * 16);
  });

  it('gives every table a 4-byte aligned offset, its original length and a matching checksum', () => {
    for (const [tag, t] of sfntTables(ttf)) {
      expect(t.offset % 4, tag).toBe(0);
      const data = Buffer.from(ttf.subarray(t.offset, t.offset + t.length));
      if (tag === 'head') data.writeUInt32BE(0, 8); // checksummed with checkSumAdjustment zeroed
      expect(sfntChecksum(data), tag).toBe(t.checksum);
    }
  });

  it('sets head.checkSumAdjustment so the whole font sums to 0xB1B0AFBA', () => {
    expect(sfntChecksum(ttf)).toBe(0xb1b0afba);
  });

  it('lists tables in ascending tag order, as binary search in the directory needs', () => {
    const tags = [...sfntTables(ttf).keys()];
    expect(tags).toEqual([...tags].sort());
  });

  it('refuses bytes that are not a WOFF 1.0 font', () => {
    expect(() => woffToSfnt(Buffer.from('not a font at all, just text padding it out past 44 bytes'))).toThrow(/WOFF/);
    expect(() => woffToSfnt(ttf)).toThrow(/wOFF signature/);
  });

  it('refuses a WOFF whose table runs past the end of the file', () => {
    expect(() => woffToSfnt(woff.subarray(0, woff.length - 200))).toThrow(/past the end/);
  });
});

describe('plexMonoTtf', () => {
  it('converts once and then hands out the cached buffer', () => {
    expect(plexMonoTtf('regular')).toBe(plexMonoTtf('regular'));
    expect(plexMonoTtf('semibold')).not.toBe(plexMonoTtf('regular'));
  });

  it('embeds in a PDF that poppler reads as IBM Plex Mono, regular and semibold', async () => {
    const pdf = await renderWith('Temperature 1050 °C, 2.5 µm');
    const fonts = pdfFonts(pdf);
    expect(fonts.find((f) => f.name.endsWith('+IBMPlexMono-Regular'))?.embedded).toBe(true);
    expect(fonts.find((f) => f.name.endsWith('+IBMPlexMono-SemiBold'))?.embedded).toBe(true);
    // Drawn glyphs map back to the same text, so they are real glyphs, not blanks.
    expect(pdfText(pdf)).toContain('Temperature 1050 °C, 2.5 µm');
  });
});

describe('glyph coverage of the shipped latin subset', () => {
  const points = cmapCodePoints(plexMonoTtf('regular'));

  it.each(['°', 'µ', '²', '³', '±', '—', '·', '×', '−', '…'])('has %s', (ch) => {
    expect(points.has(ch.codePointAt(0)!)).toBe(true);
  });

  // Why fitToPlex exists: these have no glyph in the subset the package ships.
  it.each(['Ω', '⁻', '⁵', '→', '√'])('lacks %s', (ch) => {
    expect(points.has(ch.codePointAt(0)!)).toBe(false);
  });
});

describe('fitToPlex', () => {
  it.each([
    ['cm⁻³', 'cm-3'],
    ['5.0e15 cm⁻²', '5.0e15 cm-2'],
    ['1.2×10¹⁵ cm⁻²', '1.2×10^15 cm-2'],
    ['18.6 Ω/sq', '18.6 ohm/sq'],
    ['10 Ω·cm', '10 ohm·cm'],
    ['2 μm', '2 µm'],
    ['4 cm²', '4 cm²'],
    ['1050 °C ± 2 °C', '1050 °C ± 2 °C'],
    ['750 → 1050 °C', '750 -> 1050 °C'],
    ['Δ xj ≤ 0.1 µm', 'delta xj <= 0.1 µm'],
    ['Δxj', 'delta xj'],
    ['Dépôt', 'Dépôt'],
    ['炉', '?'],
  ])('prints %s as %s', (input, expected) => {
    expect(fitToPlex(input)).toBe(expected);
  });

  it('leaves only characters the font has', () => {
    const points = cmapCodePoints(plexMonoTtf('regular'));
    const out = fitToPlex('Ωαβσ∞≈ ⁰¹²³⁴⁵⁶⁷⁸⁹⁺⁻ ŁŒœ 炉');
    for (const ch of out) expect(points.has(ch.codePointAt(0)!), ch).toBe(true);
  });
});
