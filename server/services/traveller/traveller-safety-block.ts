// The "Safety" section: one caution per hazard the steps bring, then the deferral
// to site procedures, which is printed on every traveller whatever the steps are.
/// <reference types="pdfkit" />
import { SAFETY_DEFERRAL, safetyItemsFor } from './safety';
import type { TravellerInput } from './types';
import { COLOR, FONT, SIZE, contentWidth, draw, ensureSpace, heightOf, sectionTitle, widthOf } from './traveller-style';

const TITLE = { font: FONT.textBold, size: SIZE.body, color: COLOR.ink } as const;
const STEPS = { font: FONT.data, size: SIZE.small, color: COLOR.muted } as const;
const BODY = { font: FONT.text, size: SIZE.body - 0.3, color: COLOR.ink } as const;
const DEFERRAL = { font: FONT.textBold, size: SIZE.body, color: COLOR.ink } as const;
const INDENT = 9;
const ITEM_GAP = 7;

/** 'steps 1–6, 8, 10–14': runs of three or more consecutive steps shortened to a range. */
export function stepsNote(steps: readonly number[]): string {
  if (steps.length === 0) return '';
  const parts: string[] = [];
  for (let i = 0; i < steps.length; ) {
    let j = i;
    while (j + 1 < steps.length && steps[j + 1] === steps[j] + 1) j++;
    if (j - i >= 2) parts.push(`${steps[i]}–${steps[j]}`);
    else for (let k = i; k <= j; k++) parts.push(String(steps[k]));
    i = j + 1;
  }
  return `step${steps.length === 1 ? '' : 's'} ${parts.join(', ')}`;
}

export function drawSafety(doc: PDFKit.PDFDocument, input: TravellerInput): void {
  const left = doc.page.margins.left;
  const width = contentWidth(doc) - INDENT;
  const items = safetyItemsFor(input.steps);
  const itemHeight = (text: string) => TITLE.size + 3 + heightOf(doc, text, BODY, width);

  ensureSpace(doc, 30 + (items[0] ? itemHeight(items[0].text) : 40));
  sectionTitle(doc, 'Safety', 'cautions for the sources, gases and equipment these steps use');

  for (const item of items) {
    const h = itemHeight(item.text);
    if (ensureSpace(doc, h)) sectionTitle(doc, 'Safety', 'continued');
    const y = doc.y;
    doc.rect(left, y, 2, h).fill(COLOR.accent);
    draw(doc, item.title, TITLE, left + INDENT, y, { lineBreak: false });
    const note = stepsNote(item.steps);
    if (note) {
      const x = left + INDENT + widthOf(doc, item.title, TITLE) + 8;
      draw(doc, note, STEPS, x, y + 1, { width: left + INDENT + width - x, height: STEPS.size + 2, ellipsis: true });
    }
    draw(doc, item.text, BODY, left + INDENT, y + TITLE.size + 3, { width });
    doc.y = y + h + ITEM_GAP;
  }

  const pad = 7;
  const boxWidth = contentWidth(doc);
  const h = heightOf(doc, SAFETY_DEFERRAL, DEFERRAL, boxWidth - 2 * pad) + 2 * pad;
  if (ensureSpace(doc, h + 4)) sectionTitle(doc, 'Safety', 'continued');
  const y = doc.y + 2;
  doc.rect(left, y, boxWidth, h).lineWidth(0.8).fillAndStroke(COLOR.accentTint, COLOR.accent);
  draw(doc, SAFETY_DEFERRAL, DEFERRAL, left + pad, y + pad, { width: boxWidth - 2 * pad });
  doc.x = left;
  doc.y = y + h + 10;
}
