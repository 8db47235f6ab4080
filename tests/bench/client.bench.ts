/// <reference lib="dom" />
// Client budgets, printed (never failing):
//  1. initial JavaScript gzip (the entry chunk and the static imports index.html
//     preloads) against 250 KB, and the lazy Plotly chunk on its own;
//  2. keystroke → updated prediction in headless Chromium against 50 ms: the
//     median over 30 keystrokes into a step's time field, from the keydown event
//     to the performance mark the preview composable sets once the DOM shows the
//     new numbers.
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { build } from 'vite';
import type { Page } from 'playwright-core';
import { PROJECT_ROOT } from '../../server/config';
import { PREVIEW_MARK } from '../../src/composables/use-recipe-preview';
import { startAppStack } from '../support/app-stack';
import { launchBrowser, signInAs } from '../support/browser';
import { boronTwoStep } from '../support/sample-recipes';
import { report } from './measure';

const INITIAL_BUDGET_KB = 250;
const KEYSTROKE_BUDGET_MS = 50;
const KEYSTROKES = 30;
/** Longer than the preview's debounce: each keystroke is a person typing, not a burst. */
const KEY_GAP_MS = 150;

interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  imports?: string[];
}

const kb = (bytes: number) => bytes / 1024;
const line = (label: string, value: string, goal = '') => console.log(`${label.padEnd(64)} ${value.padStart(14)}${goal}`);

/** Chunks loaded for the given manifest keys: each and everything it imports statically. */
function staticClosure(manifest: Record<string, ManifestChunk>, roots: string[]): string[] {
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key) || !manifest[key]) return;
    seen.add(key);
    for (const next of manifest[key].imports ?? []) visit(next);
  };
  roots.forEach(visit);
  return [...seen].map((key) => manifest[key].file);
}

async function bundleSizes(): Promise<void> {
  const outDir = mkdtempSync(join(tmpdir(), 'tw-client-bench-'));
  try {
    await build({ root: PROJECT_ROOT, logLevel: 'error', build: { outDir, emptyOutDir: true, manifest: true } });
    const manifest = JSON.parse(readFileSync(join(outDir, '.vite', 'manifest.json'), 'utf8')) as Record<string, ManifestChunk>;
    const gz = (file: string) => gzipSync(readFileSync(join(outDir, file))).length;
    const entries = Object.keys(manifest).filter((key) => manifest[key].isEntry);
    const initial = staticClosure(manifest, entries);
    const sum = (files: string[]) => files.reduce((total, f) => total + gz(f), 0);
    const verdict = (bytes: number) => `  goal ≤ ${INITIAL_BUDGET_KB} KB  ${kb(bytes) <= INITIAL_BUDGET_KB ? 'met' : 'NOT MET'}`;
    line(`initial JavaScript, gzip (entry + ${initial.length - 1} static imports)`, `${kb(sum(initial)).toFixed(1)} KB`, verdict(sum(initial)));
    // Opening a recipe also loads the workspace view's chunks (still before any plot).
    const workspace = staticClosure(manifest, [...entries, 'src/views/RecipeWorkspaceView.vue']);
    line(`  … plus the Recipe workspace route (${workspace.length} chunks)`, `${kb(sum(workspace)).toFixed(1)} KB`, verdict(sum(workspace)));
    const plotly = Object.values(manifest).filter((c) => /plotly\.min/i.test(c.file));
    const plotlyInitial = plotly.some((c) => initial.includes(c.file));
    for (const c of plotly) line(`Plotly chunk ${c.file}, gzip`, `${kb(gz(c.file)).toFixed(1)} KB`, plotlyInitial ? '  IN THE INITIAL LOAD' : '  lazy (own chunk)');
    if (!plotly.length) line('Plotly chunk', 'not found');
  } finally {
    rmSync(outDir, { recursive: true, force: true });
  }
}

/** A boron predeposition + drive-in on the demo tubes, created through the API with the page's session. */
async function createBenchRecipe(page: Page, baseUrl: string): Promise<number> {
  const tubes = ((await (await page.request.get(`${baseUrl}/api/tubes`)).json()) as { data: { id: number; dedication: string }[] }).data;
  const boron = tubes.find((t) => t.dedication === 'p-type')!.id;
  const anneal = tubes.find((t) => t.dedication === 'undoped')!.id;
  const response = await page.request.post(`${baseUrl}/api/recipes`, {
    data: {
      name: `Bench recipe ${Date.now().toString(36)}`,
      description: 'Client benchmark (created by tests/bench/client.bench.ts)',
      document: boronTwoStep({ boron, anneal }),
    },
  });
  return ((await response.json()) as { data: { id: number } }).data.id;
}

/** What the page-side snippets touch (this file is type-checked without the DOM library). */
type PageGlobals = {
  twKeyAt: number;
  document: { addEventListener(type: 'keydown', listener: (e: { timeStamp: number }) => void, options: object): void };
};

/** Presses one key in the focused field and returns keydown → preview mark, ms, with the engine's share. */
async function timedKeystroke(page: Page, key: string): Promise<{ total: number; compute: number }> {
  await page.evaluate(() => {
    const g = globalThis as unknown as PageGlobals;
    g.twKeyAt = Infinity;
    g.document.addEventListener('keydown', (e) => (g.twKeyAt = e.timeStamp), { capture: true, once: true });
  });
  await page.keyboard.press(key);
  const handle = await page.waitForFunction(
    (mark) => {
      const at = (globalThis as unknown as PageGlobals).twKeyAt;
      const m = performance.getEntriesByName(mark).find((e) => e.startTime > at) as { startTime: number; detail?: { computeMs: number } } | undefined;
      return m ? { total: m.startTime - at, compute: m.detail?.computeMs ?? Number.NaN } : null;
    },
    PREVIEW_MARK,
    { timeout: 10_000 },
  );
  return (await handle.jsonValue())!;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const mid = Math.floor(s.length / 2);
  return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
};
const p90 = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.ceil(xs.length * 0.9) - 1];

async function keystrokeLatency(): Promise<void> {
  const stack = await startAppStack();
  const browser = await launchBrowser();
  try {
    const page = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
    await signInAs(page, stack.baseUrl, 'engineer');
    const id = await createBenchRecipe(page, stack.baseUrl);
    await page.goto(`${stack.baseUrl}/recipes/${id}`);
    await page.getByTestId('outcome-junction-depth').waitFor();
    await page.getByTestId('profile-plot').locator('[data-ready="yes"]').waitFor();
    const field = page.getByTestId('field-steps.1.timeMin');
    await field.click();
    await page.keyboard.press('End');
    const totals: number[] = [];
    const computes: number[] = [];
    for (let i = 0; i < KEYSTROKES; i++) {
      // Alternately append a digit and take it away: 60 → 605 → 60 min, always a valid time.
      const { total, compute } = await timedKeystroke(page, i % 2 === 0 ? '5' : 'Backspace');
      totals.push(total);
      computes.push(compute);
      await page.waitForTimeout(KEY_GAP_MS);
    }
    report(`keystroke → updated prediction, median of ${KEYSTROKES} (Chromium)`, median(totals), KEYSTROKE_BUDGET_MS);
    report('keystroke → updated prediction, 90th percentile', p90(totals));
    report('of which the engine (computeRecipe), median', median(computes));
  } finally {
    await browser.close();
    await stack.stop();
  }
}

export default async function clientBench(): Promise<void> {
  await bundleSizes();
  await keystrokeLatency();
}
