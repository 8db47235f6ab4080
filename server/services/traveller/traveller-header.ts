// The traveller's first block: what is run (recipe, version, prediction basis), on
// what (lot, wafers, tube, substrate), who released it and who printed it.
/// <reference types="pdfkit" />
import type { RecipeState, TravellerInput } from './types';
import { COLOR, FONT, SIZE, contentWidth, draw, heightOf, widthOf } from './traveller-style';

const STATE_LABEL: Record<RecipeState, string> = {
  draft: 'draft',
  in_review: 'in review',
  released: 'released',
  retired: 'retired',
};

type Pair = [key: string, value: string];

function recipePairs(input: TravellerInput): Pair[] {
  const r = input.recipe;
  return [
    ['Recipe', r.code ? `${r.name} (${r.code})` : r.name],
    ['Version', `v${r.versionNo} · ${STATE_LABEL[r.state]}`],
    ['Parameters', r.parameterSetLabel],
    ['Engine', r.engineVersion],
    ['Calibration', r.calibrationNote?.trim() || 'none'],
    ['Substrate', input.substrate],
  ];
}

function lotPairs(input: TravellerInput): Pair[] {
  const { lot, release } = input;
  const signed: Pair = release
    ? ['Signed', `${release.signedBy} · ${release.signedAt}\n“${release.meaning}”`]
    : ['Signed', 'not signed'];
  const lotRows: Pair[] = lot
    ? [
        ['Lot', lot.lotId],
        ['Wafers', String(lot.wafers)],
        ['Tube', lot.tubeName],
        ['Opened', `${lot.openedBy} · ${lot.openedAt}`],
      ]
    : [['Lot', 'no lot opened']];
  return [...lotRows, signed, ['Printed', `${input.printedBy} · ${input.printedAt}`]];
}

// Tube names are often 'Tube B3' already; avoid printing 'tube Tube B3'.
const tubeWithWord = (name: string) => (/^tube\b/i.test(name) ? name : `tube ${name}`);

const KEY = { font: FONT.text, size: SIZE.small, color: COLOR.muted } as const;
const VALUE = { font: FONT.data, size: SIZE.data, color: COLOR.ink } as const;
const KEY_WIDTH = 54;
const PAIR_GAP = 3.5;
const PANEL_PAD = 8;

function pairsHeight(doc: PDFKit.PDFDocument, pairs: Pair[], width: number): number {
  return pairs.reduce((h, [, v]) => h + heightOf(doc, v, VALUE, width - KEY_WIDTH) + PAIR_GAP, -PAIR_GAP);
}

function drawPairs(doc: PDFKit.PDFDocument, pairs: Pair[], x: number, y: number, width: number): void {
  for (const [k, v] of pairs) {
    draw(doc, k, KEY, x, y + 0.8, { width: KEY_WIDTH - 4, lineBreak: false });
    draw(doc, v, VALUE, x + KEY_WIDTH, y, { width: width - KEY_WIDTH });
    y += heightOf(doc, v, VALUE, width - KEY_WIDTH) + PAIR_GAP;
  }
}

function stateBadge(doc: PDFKit.PDFDocument, state: RecipeState, right: number, y: number): void {
  const released = state === 'released';
  const label = released ? 'RELEASED' : `${STATE_LABEL[state].toUpperCase()} · NOT RELEASED`;
  const run = { font: FONT.textBold, size: SIZE.small + 0.5 } as const;
  const w = widthOf(doc, label, run) + label.length * 0.6 + 14;
  const x = right - w;
  if (released) doc.roundedRect(x, y, w, 16, 3).fill(COLOR.accent);
  else doc.roundedRect(x, y, w, 16, 3).lineWidth(1).stroke(COLOR.warning);
  draw(doc, label, { ...run, color: released ? '#ffffff' : COLOR.warning }, x + 7, y + 5, {
    lineBreak: false,
    characterSpacing: 0.6,
  });
}

/** Draws the header block from the top of the page and leaves the cursor below it. */
export function drawHeader(doc: PDFKit.PDFDocument, input: TravellerInput): void {
  const left = doc.page.margins.left;
  const width = contentWidth(doc);
  let y = doc.page.margins.top;

  draw(doc, `${input.product.toUpperCase()}  ·  RUN TRAVELLER`, { font: FONT.textBold, size: SIZE.small, color: COLOR.accent }, left, y, {
    lineBreak: false,
    characterSpacing: 0.6, // wider spacing makes text extractors split the words into letters
  });
  stateBadge(doc, input.recipe.state, left + width, y - 3);
  y += 14;

  const titleRun = { font: FONT.dataBold, size: SIZE.title, color: COLOR.ink } as const;
  const titleWidth = width - 150;
  draw(doc, input.recipe.name, titleRun, left, y, { width: titleWidth });
  y += heightOf(doc, input.recipe.name, titleRun, titleWidth) + 2;

  const lot = input.lot;
  const subtitle = [`version ${input.recipe.versionNo}`, lot ? `lot ${lot.lotId}` : 'no lot', lot ? `${lot.wafers} wafers` : null, lot ? tubeWithWord(lot.tubeName) : null]
    .filter(Boolean)
    .join('  ·  ');
  draw(doc, subtitle, { font: FONT.data, size: 8.6, color: COLOR.muted }, left, y, { width });
  y += 18;

  const colGap = 18;
  const colWidth = (width - 2 * PANEL_PAD - colGap) / 2;
  const leftPairs = recipePairs(input);
  const rightPairs = lotPairs(input);
  const panelHeight = Math.max(pairsHeight(doc, leftPairs, colWidth), pairsHeight(doc, rightPairs, colWidth)) + 2 * PANEL_PAD;
  doc.rect(left, y, width, panelHeight).fill(COLOR.faint);
  doc.rect(left, y, 2.5, panelHeight).fill(COLOR.accent);
  drawPairs(doc, leftPairs, left + PANEL_PAD + 4, y + PANEL_PAD, colWidth - 4);
  drawPairs(doc, rightPairs, left + PANEL_PAD + colWidth + colGap, y + PANEL_PAD, colWidth);

  doc.x = left;
  doc.y = y + panelHeight + 16;
}
