// Reads rendered PDFs back with poppler-utils (pdftotext, pdffonts, pdfinfo): an
// outside reader, so the tests check what a viewer sees, not what pdfkit was told.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

function withFile<T>(pdf: Buffer, read: (path: string) => T): T {
  const dir = mkdtempSync(join(tmpdir(), 'traveller-'));
  try {
    const path = join(dir, 'doc.pdf');
    writeFileSync(path, pdf);
    return read(path);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Text of the whole document, or of one 1-based page, in content order (pdftotext -raw). */
export function pdfText(pdf: Buffer, page?: number): string {
  const range = page ? ['-f', String(page), '-l', String(page)] : [];
  return withFile(pdf, (path) => execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', ...range, path, '-'], { encoding: 'utf8' }));
}

/** Whitespace collapsed to single spaces, so sentences read whole across line wraps. */
export const flat = (text: string): string => text.replace(/\s+/g, ' ');

/** Whitespace removed: rotated text comes out one letter per line. */
export const compact = (text: string): string => text.replace(/\s+/g, '');

export function pdfPageCount(pdf: Buffer): number {
  const info = withFile(pdf, (path) => execFileSync('pdfinfo', [path], { encoding: 'utf8' }));
  const match = /^Pages:\s+(\d+)/m.exec(info);
  if (!match) throw new Error(`pdfinfo printed no page count:\n${info}`);
  return Number(match[1]);
}

export interface PdfFont {
  name: string;
  type: string;
  embedded: boolean;
}

export function pdfFonts(pdf: Buffer): PdfFont[] {
  const out = withFile(pdf, (path) => execFileSync('pdffonts', [path], { encoding: 'utf8' }));
  return out
    .split('\n')
    .slice(2)
    .filter((line) => line.trim())
    .map((line) => {
      // name type... encoding emb sub uni objectId gen: read the flags from the right.
      const cols = line.trim().split(/\s+/);
      return { name: cols[0], type: cols.slice(1, -6).join(' '), embedded: cols[cols.length - 5] === 'yes' };
    });
}

export interface WordBox {
  page: number;
  word: string;
  xMin: number;
  xMax: number;
  yMin: number;
  yMax: number;
}

/** Every word's bounding box in points from the page's top-left (pdftotext -bbox). */
export function pdfWordBoxes(pdf: Buffer): WordBox[] {
  const html = withFile(pdf, (path) => execFileSync('pdftotext', ['-bbox', '-enc', 'UTF-8', path, '-'], { encoding: 'utf8' }));
  const boxes: WordBox[] = [];
  let page = 0;
  for (const line of html.split('\n')) {
    if (line.includes('<page ')) page++;
    const m = /<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">(.*)<\/word>/.exec(line);
    if (m) boxes.push({ page, word: m[5], xMin: +m[1], yMin: +m[2], xMax: +m[3], yMax: +m[4] });
  }
  return boxes;
}
