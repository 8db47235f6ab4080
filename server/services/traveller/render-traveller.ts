// Run traveller PDFs: one lot, or many lots in one printable PDF for a batch print.
import PDFDocument from 'pdfkit';
import { registerPlexMono } from './plex-mono-font';
import { drawHeader } from './traveller-header';
import { markPages } from './traveller-page-marks';
import { drawSafety } from './traveller-safety-block';
import { drawSteps } from './traveller-steps';
import { PAGE } from './traveller-style';
import { drawTargets } from './traveller-targets';
import type { TravellerInput } from './types';

export type BatchProgress = (done: number, total: number) => void;

function titleOf(input: TravellerInput): string {
  const lot = input.lot ? ` — lot ${input.lot.lotId}` : '';
  return `Run traveller — ${input.recipe.name} v${input.recipe.versionNo}${lot}`;
}

function newDocument(title: string): PDFKit.PDFDocument {
  const doc = new PDFDocument({
    size: 'A4',
    bufferPages: true,
    autoFirstPage: false,
    margins: { top: PAGE.margin, left: PAGE.margin, right: PAGE.margin, bottom: PAGE.bottomMargin },
    info: { Title: title, Creator: 'Tubewright', Producer: 'Tubewright (pdfkit)' },
    displayTitle: true,
    lang: 'en',
  });
  registerPlexMono(doc);
  return doc;
}

/** Lays out one traveller from a fresh page; page marks come once all pages exist. */
function layOut(doc: PDFKit.PDFDocument, input: TravellerInput): { first: number; count: number } {
  doc.addPage();
  const first = doc.bufferedPageRange().start + doc.bufferedPageRange().count - 1;
  drawHeader(doc, input);
  drawSteps(doc, input);
  drawTargets(doc, input);
  drawSafety(doc, input);
  const range = doc.bufferedPageRange();
  return { first, count: range.start + range.count - first };
}

function finish(doc: PDFKit.PDFDocument): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
    doc.end();
  });
}

/** Renders one run traveller as an A4 PDF. Versions that are not released carry the not-released mark on every page. */
export async function renderTraveller(input: TravellerInput): Promise<Buffer> {
  const doc = newDocument(titleOf(input));
  const { first, count } = layOut(doc, input);
  markPages(doc, input, first, count);
  return finish(doc);
}

/**
 * Renders many travellers into one PDF (one print job), each starting on a new page
 * with its own "page N of M". `onProgress(done, total)` is called after each
 * traveller, and the event loop gets a turn in between, so a route can stream the
 * progress to a progress bar while the batch is laid out.
 */
export async function renderTravellerBatch(inputs: readonly TravellerInput[], onProgress?: BatchProgress): Promise<Buffer> {
  if (inputs.length === 0) throw new RangeError('a traveller batch needs at least one traveller');
  const doc = newDocument(inputs.length === 1 ? titleOf(inputs[0]) : `Run travellers — ${inputs.length} lots`);
  const ranges: Array<{ first: number; count: number }> = [];
  for (const [i, input] of inputs.entries()) {
    ranges.push(layOut(doc, input));
    onProgress?.(i + 1, inputs.length);
    await new Promise<void>((resolve) => setImmediate(resolve));
  }
  ranges.forEach(({ first, count }, i) => markPages(doc, inputs[i], first, count));
  return finish(doc);
}
