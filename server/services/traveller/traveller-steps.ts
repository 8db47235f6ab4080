// The steps table: what to set on the tube for each step, and where the operator
// records initials, start and end time.
/// <reference types="pdfkit" />
import type { StepKind, TravellerInput, TravellerStep } from './types';
import { drawTable, type Column } from './traveller-table';
import { COLOR, FONT, SIZE, draw, ensureSpace, heightOf, sectionTitle, writeInBox } from './traveller-style';

const KIND_LABEL: Record<StepKind, string> = {
  predeposition: 'PREDEPOSITION',
  implant: 'IMPLANT',
  anneal: 'ANNEAL / DRIVE-IN',
  oxidation: 'OXIDATION',
};

const DATA = { font: FONT.data, size: SIZE.data } as const;
const DATA_BOLD = { font: FONT.dataBold, size: SIZE.data } as const;
const SMALL_DATA = { font: FONT.data, size: SIZE.small, color: COLOR.muted } as const;
const KIND = { font: FONT.textBold, size: SIZE.label, color: COLOR.accent } as const;
const SETPOINT_LABEL = { font: FONT.text, size: SIZE.small, color: COLOR.muted } as const;
const SETPOINT_GAP = 2;

const sourceLine = (s: TravellerStep) => [s.dopant, s.source].filter(Boolean).join(' · ');

/** Stacks step-cell lines: kind, label, then dopant and source; returns their total height. */
function stepCell(doc: PDFKit.PDFDocument, s: TravellerStep, x: number, y: number, width: number, paint: boolean): number {
  const lines: Array<[string, typeof KIND | typeof DATA | typeof SMALL_DATA]> = [
    [KIND_LABEL[s.kind], KIND],
    [s.label, DATA],
  ];
  const source = sourceLine(s);
  if (source) lines.push([source, SMALL_DATA]);
  let h = 0;
  for (const [text, run] of lines) {
    if (paint) draw(doc, text, run, x, y + h, { width, characterSpacing: run === KIND ? 0.4 : 0 });
    h += heightOf(doc, text, run, width) + 1.5;
  }
  return h - 1.5;
}

/** Label on the left, value in Plex Mono on the right part of the cell, one setpoint per line. */
function setpointsCell(doc: PDFKit.PDFDocument, s: TravellerStep, x: number, y: number, width: number, paint: boolean): number {
  if (s.setpoints.length === 0) {
    if (paint) draw(doc, 'no setpoints', SETPOINT_LABEL, x, y, { width });
    return heightOf(doc, 'no setpoints', SETPOINT_LABEL, width);
  }
  const labelWidth = Math.round(width * 0.44);
  const valueWidth = width - labelWidth;
  let h = 0;
  for (const sp of s.setpoints) {
    const lh = Math.max(heightOf(doc, sp.label, SETPOINT_LABEL, labelWidth - 3), heightOf(doc, sp.value, DATA, valueWidth));
    if (paint) {
      draw(doc, sp.label, SETPOINT_LABEL, x, y + h + 0.6, { width: labelWidth - 3 });
      draw(doc, sp.value, DATA, x + labelWidth, y + h, { width: valueWidth });
    }
    h += lh + SETPOINT_GAP;
  }
  return h - SETPOINT_GAP;
}

const RECORD_BOX = 12;
const RECORD_GAP = 3;
const RECORD_FIELDS = ['initials', 'start', 'end'];
const RECORD_HEIGHT = RECORD_FIELDS.length * RECORD_BOX + (RECORD_FIELDS.length - 1) * RECORD_GAP;

function stepColumns(defaultTube: string): Column<TravellerStep>[] {
  const tubeOf = (s: TravellerStep) => s.tubeName ?? defaultTube;
  return [
    {
      title: '#',
      share: 0.045,
      measure: (doc, s, w) => heightOf(doc, String(s.index), DATA_BOLD, w),
      draw: (doc, s, c) => draw(doc, String(s.index), DATA_BOLD, c.x, c.y, { width: c.width }),
    },
    {
      title: 'Step',
      share: 0.235,
      measure: (doc, s, w) => stepCell(doc, s, 0, 0, w, false),
      draw: (doc, s, c) => void stepCell(doc, s, c.x, c.y, c.width, true),
    },
    {
      title: 'Tube',
      share: 0.09,
      measure: (doc, s, w) => heightOf(doc, tubeOf(s), DATA, w),
      draw: (doc, s, c) => draw(doc, tubeOf(s), DATA, c.x, c.y, { width: c.width }),
    },
    {
      title: 'Setpoints and ramps',
      share: 0.33,
      measure: (doc, s, w) => setpointsCell(doc, s, 0, 0, w, false),
      draw: (doc, s, c) => void setpointsCell(doc, s, c.x, c.y, c.width, true),
    },
    {
      title: 'Ambient',
      share: 0.13,
      measure: (doc, s, w) => heightOf(doc, s.ambient ?? '—', DATA, w),
      draw: (doc, s, c) => draw(doc, s.ambient ?? '—', DATA, c.x, c.y, { width: c.width }),
    },
    {
      title: 'Record',
      share: 0.17,
      measure: () => RECORD_HEIGHT,
      draw: (doc, _s, c) => {
        const captionWidth = 26;
        RECORD_FIELDS.forEach((field, i) => {
          const y = c.y + i * (RECORD_BOX + RECORD_GAP);
          draw(doc, field, SETPOINT_LABEL, c.x, y + 3, { width: captionWidth, lineBreak: false });
          writeInBox(doc, c.x + captionWidth, y, c.width - captionWidth, RECORD_BOX);
        });
      },
    },
  ];
}

/** Draws the "Steps" section; keeps its title on the page of its first row. */
export function drawSteps(doc: PDFKit.PDFDocument, input: TravellerInput): void {
  ensureSpace(doc, 30 + 15 + RECORD_HEIGHT + 10);
  const count = input.steps.length;
  sectionTitle(doc, 'Steps', `${count} step${count === 1 ? '' : 's'} in order · read Safety before the first · record each step as it is run`);
  drawTable(doc, {
    columns: stepColumns(input.lot?.tubeName ?? '—'),
    rows: input.steps,
    minRowHeight: RECORD_HEIGHT + 8,
    continuedTitle: 'Steps',
  });
}
