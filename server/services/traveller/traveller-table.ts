// A small table for the traveller: every row is measured before it is drawn, so a
// row never splits across pages, and the column header is repeated on each page
// the table continues onto.
/// <reference types="pdfkit" />
import { CELL_PAD, COLOR, FONT, SIZE, contentBottom, draw, sectionTitle } from './traveller-style';

export interface Cell {
  x: number;
  y: number;
  /** Width inside the padding. */
  width: number;
  /** Full row height (the cell's box, padding included). */
  rowHeight: number;
}

export interface Column<R> {
  title: string;
  /** Fraction of the table width; the fractions of all columns add up to 1. */
  share: number;
  /** Height of the cell's content (without padding) at the given inner width. */
  measure(doc: PDFKit.PDFDocument, row: R, innerWidth: number): number;
  draw(doc: PDFKit.PDFDocument, row: R, cell: Cell): void;
}

export interface TableSpec<R> {
  columns: Column<R>[];
  rows: R[];
  minRowHeight?: number;
  /** Section title repeated, marked "continued", above the header on a new page. */
  continuedTitle: string;
}

const HEADER_HEIGHT = 15;

function drawHeader<R>(doc: PDFKit.PDFDocument, columns: Column<R>[], xs: number[], widths: number[], y: number): void {
  const x0 = xs[0];
  const total = widths.reduce((a, b) => a + b, 0);
  doc.rect(x0, y, total, HEADER_HEIGHT).fill(COLOR.accentTint);
  columns.forEach((col, i) => {
    draw(doc, col.title.toUpperCase(), { font: FONT.textBold, size: SIZE.label, color: COLOR.accent }, xs[i] + CELL_PAD.x, y + 5, {
      width: widths[i] - 2 * CELL_PAD.x,
      lineBreak: false,
      characterSpacing: 0.3,
    });
  });
  doc.moveTo(x0, y + HEADER_HEIGHT).lineTo(x0 + total, y + HEADER_HEIGHT).lineWidth(0.8).strokeColor(COLOR.accent).stroke();
}

/** Draws the table from the cursor down, page-breaking between rows; leaves the cursor below it. */
export function drawTable<R>(doc: PDFKit.PDFDocument, spec: TableSpec<R>): void {
  const left = doc.page.margins.left;
  const total = doc.page.width - left - doc.page.margins.right;
  const widths = spec.columns.map((c) => Math.round(c.share * total * 10) / 10);
  widths[widths.length - 1] = total - widths.slice(0, -1).reduce((a, b) => a + b, 0);
  const xs = widths.map((_, i) => left + widths.slice(0, i).reduce((a, b) => a + b, 0));

  const rowHeight = (row: R) =>
    Math.max(
      spec.minRowHeight ?? 0,
      ...spec.columns.map((c, i) => c.measure(doc, row, widths[i] - 2 * CELL_PAD.x) + 2 * CELL_PAD.y),
    );

  let y = doc.y;
  drawHeader(doc, spec.columns, xs, widths, y);
  y += HEADER_HEIGHT;

  for (const row of spec.rows) {
    const h = rowHeight(row);
    if (y + h > contentBottom(doc)) {
      doc.addPage();
      sectionTitle(doc, spec.continuedTitle, 'continued');
      y = doc.y;
      drawHeader(doc, spec.columns, xs, widths, y);
      y += HEADER_HEIGHT;
    }
    spec.columns.forEach((col, i) => {
      col.draw(doc, row, { x: xs[i] + CELL_PAD.x, y: y + CELL_PAD.y, width: widths[i] - 2 * CELL_PAD.x, rowHeight: h });
    });
    for (let i = 1; i < xs.length; i++) {
      doc.moveTo(xs[i], y).lineTo(xs[i], y + h).lineWidth(0.4).strokeColor(COLOR.rule).stroke();
    }
    doc.moveTo(left, y + h).lineTo(left + total, y + h).lineWidth(0.5).strokeColor(COLOR.rule).stroke();
    y += h;
  }
  doc.x = left;
  doc.y = y + 12;
}
