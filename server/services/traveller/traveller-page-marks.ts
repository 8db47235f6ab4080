// Marks drawn on finished pages (pdfkit bufferPages): the footer with "page N of M"
// counted per traveller, and the diagonal not-released mark on every page of a
// traveller whose version is not released.
/// <reference types="pdfkit" />
import type { TravellerInput } from './types';
import { COLOR, FONT, SIZE, draw, widthOf } from './traveller-style';

export const NOT_RELEASED_MARK = 'NOT RELEASED — DO NOT RUN';

/** Whether a traveller may be run: only a released version prints without the mark. */
export const isRunnable = (input: TravellerInput): boolean => input.recipe.state === 'released';

function footer(doc: PDFKit.PDFDocument, input: TravellerInput, pageNo: number, pageCount: number): void {
  const { left, right } = doc.page.margins;
  const width = doc.page.width - left - right;
  const y = doc.page.height - 30;
  const run = { font: FONT.data, size: SIZE.small, color: COLOR.muted } as const;
  const what = [`${input.product} run traveller`, `${input.recipe.name} v${input.recipe.versionNo}`, input.lot ? `lot ${input.lot.lotId}` : 'no lot'];
  const pageText = `page ${pageNo} of ${pageCount}`;
  const pageWidth = widthOf(doc, pageText, run);

  doc.moveTo(left, y - 6).lineTo(left + width, y - 6).lineWidth(0.4).strokeColor(COLOR.rule).stroke();
  draw(doc, what.join('  ·  '), run, left, y, { width: width - pageWidth - 16, lineBreak: false, ellipsis: true });
  draw(doc, pageText, run, left + width - pageWidth, y, { lineBreak: false });
}

function notReleasedMark(doc: PDFKit.PDFDocument): void {
  const { width: w, height: h } = doc.page;
  const angle = (Math.atan2(h, w) * 180) / Math.PI;
  const run = { font: FONT.textBold, size: 100 } as const;
  const size = (100 * 0.72 * Math.hypot(w, h)) / widthOf(doc, NOT_RELEASED_MARK, run);
  const textWidth = widthOf(doc, NOT_RELEASED_MARK, { ...run, size });
  doc.save();
  doc.rotate(-angle, { origin: [w / 2, h / 2] });
  doc.fillOpacity(0.13);
  // No width option: with one, pdfkit wraps the line even when lineBreak is false.
  draw(doc, NOT_RELEASED_MARK, { ...run, size, color: COLOR.warning }, (w - textWidth) / 2, h / 2 - size * 0.36, { lineBreak: false });
  doc.restore();
}

/** Decorates buffered pages `first .. first + count - 1`, which hold one traveller. */
export function markPages(doc: PDFKit.PDFDocument, input: TravellerInput, first: number, count: number): void {
  for (let i = 0; i < count; i++) {
    doc.switchToPage(first + i);
    // Writing inside the bottom margin would otherwise make pdfkit start a new page.
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0;
    if (!isRunnable(input)) notReleasedMark(doc);
    footer(doc, input, i + 1, count);
    doc.page.margins.bottom = bottom;
  }
}
