// Predicted targets with their acceptance windows, a box for each measured value and
// an in-window tick, followed by room for the operator's notes and deviations.
/// <reference types="pdfkit" />
import type { TravellerInput, TravellerTarget } from './types';
import { drawTable, type Column } from './traveller-table';
import { COLOR, FONT, SIZE, contentWidth, draw, ensureSpace, heightOf, sectionTitle, widthOf, writeInBox } from './traveller-style';

const DATA = { font: FONT.data, size: SIZE.data } as const;
const PREDICTED = { font: FONT.dataBold, size: SIZE.data + 0.4 } as const;
const UNIT = { font: FONT.data, size: SIZE.small, color: COLOR.muted } as const;
const CAPTION = { font: FONT.text, size: SIZE.small, color: COLOR.muted } as const;
const BOX = 14;

function checkbox(doc: PDFKit.PDFDocument, x: number, y: number, caption: string): number {
  doc.rect(x, y, 8, 8).lineWidth(0.6).stroke(COLOR.muted);
  draw(doc, caption, CAPTION, x + 11, y + 1, { lineBreak: false });
  return 11 + widthOf(doc, caption, CAPTION) + 10;
}

const columns: Column<TravellerTarget>[] = [
  {
    title: 'Target',
    share: 0.3,
    measure: (doc, t, w) => heightOf(doc, t.label, DATA, w),
    draw: (doc, t, c) => draw(doc, t.label, DATA, c.x, c.y + 2, { width: c.width }),
  },
  {
    title: 'Predicted',
    share: 0.18,
    measure: (doc, t, w) => heightOf(doc, `${t.predicted} ${t.unit}`, PREDICTED, w),
    draw: (doc, t, c) => {
      draw(doc, t.predicted, PREDICTED, c.x, c.y + 2, { continued: true });
      draw(doc, ` ${t.unit}`, { ...DATA, color: COLOR.muted }, c.x, c.y + 2);
    },
  },
  {
    title: 'Window',
    share: 0.14,
    measure: (doc, t, w) => heightOf(doc, t.window, DATA, w),
    draw: (doc, t, c) => draw(doc, t.window, DATA, c.x, c.y + 2, { width: c.width }),
  },
  {
    title: 'Measured',
    share: 0.22,
    measure: () => BOX,
    draw: (doc, t, c) => {
      writeInBox(doc, c.x, c.y, c.width, BOX);
      const uw = widthOf(doc, t.unit, UNIT);
      draw(doc, t.unit, UNIT, c.x + c.width - uw - 3, c.y + 4, { lineBreak: false });
    },
  },
  {
    title: 'In window',
    share: 0.16,
    measure: () => BOX,
    draw: (doc, _t, c) => {
      const x = c.x + checkbox(doc, c.x, c.y + 3, 'yes');
      checkbox(doc, x, c.y + 3, 'no');
    },
  },
];

/** Draws the "Predicted targets" section and the notes box. */
export function drawTargets(doc: PDFKit.PDFDocument, input: TravellerInput): void {
  ensureSpace(doc, 30 + 15 + 2 * (BOX + 8));
  sectionTitle(doc, 'Predicted targets', 'measure after the last step; compare with the window');
  if (input.targets.length === 0) {
    draw(doc, 'This version has no predicted targets.', CAPTION, doc.page.margins.left, doc.y, { width: contentWidth(doc) });
    doc.moveDown(1.5);
  } else {
    drawTable(doc, { columns, rows: input.targets, minRowHeight: BOX + 8, continuedTitle: 'Predicted targets' });
  }

  const notesHeight = 58;
  ensureSpace(doc, notesHeight + 16);
  const x = doc.page.margins.left;
  writeInBox(doc, x, doc.y, contentWidth(doc), notesHeight, 'Notes and deviations (initial each entry)');
  doc.y += notesHeight + 18;
  doc.x = x;
}
