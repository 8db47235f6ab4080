// The traveller's look in one place: one accent colour on a calm grey scale, and two
// typefaces — Helvetica (pdfkit's built-in) for our own words, embedded IBM Plex Mono
// for every number, unit, id and piece of recipe data, so figures line up in columns
// and print the same on any viewer.
/// <reference types="pdfkit" />
import { PLEX_FONT, fitToPlex } from './plex-mono-font';

export const COLOR = {
  accent: '#1f5f74',
  accentTint: '#eaf1f3',
  ink: '#1c2328',
  muted: '#5e6a73',
  rule: '#c5cfd6',
  faint: '#f6f8f9',
  /** Only for the not-released mark and badge: a warning, not decoration. */
  warning: '#b42318',
} as const;

export const FONT = {
  text: 'Helvetica',
  textBold: 'Helvetica-Bold',
  data: PLEX_FONT.regular,
  dataBold: PLEX_FONT.semibold,
} as const;
export type FontName = (typeof FONT)[keyof typeof FONT];

export const SIZE = { title: 17, section: 10.5, body: 8, data: 7.6, small: 6.8, label: 6.3 } as const;

export const PAGE = { margin: 40, bottomMargin: 50 } as const;
export const CELL_PAD = { x: 4, y: 4 } as const;
export const LINE_GAP = 1;

export interface Run {
  font: FontName;
  size: number;
  color?: string;
}

const isPlex = (font: FontName) => font === FONT.data || font === FONT.dataBold;

/** The text as it will be drawn: Plex strings are fitted to the glyphs the shipped subset has. */
export function printable(text: string, font: FontName): string {
  return isPlex(font) ? fitToPlex(text, font === FONT.dataBold ? 'semibold' : 'regular') : text;
}

export function heightOf(doc: PDFKit.PDFDocument, text: string, run: Run, width: number): number {
  doc.font(run.font).fontSize(run.size);
  return doc.heightOfString(printable(text, run.font), { width, lineGap: LINE_GAP });
}

export function widthOf(doc: PDFKit.PDFDocument, text: string, run: Run): number {
  doc.font(run.font).fontSize(run.size);
  return doc.widthOfString(printable(text, run.font));
}

export function draw(
  doc: PDFKit.PDFDocument,
  text: string,
  run: Run,
  x: number,
  y: number,
  options: PDFKit.Mixins.TextOptions = {},
): void {
  doc
    .font(run.font)
    .fontSize(run.size)
    .fillColor(run.color ?? COLOR.ink)
    .text(printable(text, run.font), x, y, { lineGap: LINE_GAP, ...options });
}

/** Lowest y content may reach on a page (the footer lives below it). */
export const contentBottom = (doc: PDFKit.PDFDocument): number => doc.page.height - doc.page.margins.bottom;
export const contentWidth = (doc: PDFKit.PDFDocument): number =>
  doc.page.width - doc.page.margins.left - doc.page.margins.right;

/** Starts a new page when `height` does not fit below the cursor; true when it did. */
export function ensureSpace(doc: PDFKit.PDFDocument, height: number): boolean {
  if (doc.y + height <= contentBottom(doc)) return false;
  doc.addPage();
  return true;
}

/** Section title with a hairline in the accent colour. */
export function sectionTitle(doc: PDFKit.PDFDocument, title: string, note?: string): void {
  const x = doc.page.margins.left;
  const y = doc.y;
  draw(doc, title, { font: FONT.textBold, size: SIZE.section, color: COLOR.accent }, x, y, { lineBreak: false });
  if (note) {
    const w = widthOf(doc, title, { font: FONT.textBold, size: SIZE.section });
    draw(doc, note, { font: FONT.text, size: SIZE.small, color: COLOR.muted }, x + w + 8, y + 3, { lineBreak: false });
  }
  const ruleY = y + SIZE.section + 4;
  doc.moveTo(x, ruleY).lineTo(x + contentWidth(doc), ruleY).lineWidth(0.8).strokeColor(COLOR.accent).stroke();
  doc.x = x;
  doc.y = ruleY + 6;
}

/** An empty write-in box, optionally with a small caption inside its top-left corner. */
export function writeInBox(doc: PDFKit.PDFDocument, x: number, y: number, w: number, h: number, caption?: string): void {
  doc.rect(x, y, w, h).lineWidth(0.6).fillAndStroke('#ffffff', COLOR.muted);
  if (caption) draw(doc, caption, { font: FONT.text, size: SIZE.label, color: COLOR.muted }, x + 2.5, y + 2, { lineBreak: false });
}
