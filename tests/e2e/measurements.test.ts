// Measured results end to end in the built app: an operator opens a demo lot,
// uploads a profile with bad rows and sees every bad line with nothing stored,
// then a good profile and sees it over the prediction with the comparison; an
// engineer refits Tube 3 on the Calibration screen and finds the new fit at
// the top of its history. Every assertion reads what the screen shows.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, shot, signInAs } from '../support/browser';

const LOT = 'HPL-26-0412';
const TUBE = 'Tube 3 · anneal';
const GOOD_FILE = `e2e-sims-${Date.now().toString(36)}.csv`;

let browser: Browser;
let operator: Page;
let engineer: Page;
const seen: { measuredXj?: string } = {};

beforeAll(async () => {
  browser = await launchBrowser();
  [operator, engineer] = await Promise.all([
    browser.newPage({ viewport: { width: 1440, height: 1000 } }),
    browser.newPage({ viewport: { width: 1440, height: 1000 } }),
  ]);
  await signInAs(operator, inject('baseUrl'), 'operator');
  await signInAs(engineer, inject('baseUrl'), 'engineer');
});
afterAll(async () => {
  await browser?.close();
});

/** The number in a text such as "1.549 µm" or "−2.62 Ω/□" (Unicode minus included). */
function numberIn(text: string | null): number {
  const match = /[-−+]?\d+(?:\.\d+)?/.exec(text ?? '');
  if (!match) throw new Error(`no number in ${JSON.stringify(text)}`);
  return Number(match[0].replace('−', '-'));
}

const text = async (page: Page, testid: string) => (await page.getByTestId(testid).first().textContent())?.trim() ?? '';
const fileRows = (page: Page) => page.getByTestId('measurement-files').locator('tbody tr');

/**
 * An invented boron profile, depths in nm with no concentration unit in the file
 * (the form supplies cm⁻³): a Gaussian of 1.5×10¹⁹ cm⁻³ at the surface and 0.5424 µm
 * characteristic length, which crosses any background between 10¹⁵ and 10¹⁶ cm⁻³
 * between 1.47 and 1.68 µm.
 */
function goodProfileCsv(): string {
  const rows = Array.from({ length: 121 }, (_, i) => {
    const xUm = i * 0.02;
    return `${(xUm * 1000).toFixed(0)},${(1.5e19 * Math.exp(-((xUm / 0.5424) ** 2))).toExponential(4)}`;
  });
  return ['# INVENTED TEST DATA, not a measurement', '# species: B', 'depth (nm),concentration', ...rows].join('\n') + '\n';
}

async function upload(page: Page, name: string, body: string) {
  await page.getByTestId('measurement-file').setInputFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(body) });
  await page.getByTestId('measurement-upload').click();
}

describe('measured results', () => {
  it('an operator uploads a profile with bad rows: every bad line is listed and nothing is stored', async () => {
    const page = operator;
    await page.goto(`${inject('baseUrl')}/lots`);
    await page.getByTestId(`lot-row-${LOT}`).click();
    await page.getByTestId('measured-results').waitFor();
    await fileRows(page).first().waitFor();
    const before = await fileRows(page).count();

    const bad = 'depth (um),concentration (cm^-3)\n0,1e19\n0.1,lots\n0.2,-5\n0.3,1e16\n';
    await upload(page, 'bad-sims.csv', bad);
    const errors = page.getByTestId('measurement-line-errors');
    await errors.waitFor();
    await shot(page, 'measurements-bad-file');

    expect(await errors.textContent()).toContain('Nothing was stored');
    expect(await errors.getByTestId('measurement-line-number').allTextContents()).toEqual(['3', '4']);
    const messages = await errors.getByTestId('measurement-line-error').allTextContents();
    expect(messages[0]).toContain('concentration "lots" must be a number');
    expect(messages[1]).toContain('concentration "-5" must be a number ≥ 0');

    // Nothing stored: the list is unchanged, also after loading the page again.
    expect(await fileRows(page).count()).toBe(before);
    await page.reload();
    await fileRows(page).first().waitFor();
    expect(await fileRows(page).count()).toBe(before);
    expect(await page.getByTestId('measurement-files').textContent()).not.toContain('bad-sims.csv');
  });

  it('a good profile is stored, drawn over the prediction, and compared with it', async () => {
    const page = operator;
    const before = await fileRows(page).count();
    await page.getByTestId('measurement-file').setInputFiles({ name: GOOD_FILE, mimeType: 'text/csv', buffer: Buffer.from(goodProfileCsv()) });
    // The file declares depth in nm but no concentration unit: the form asks for that one only.
    await page.getByTestId('measurement-declared').waitFor();
    expect(await text(page, 'measurement-declared')).toContain('depth in nm');
    expect(await page.getByTestId('measurement-unit-depth').count()).toBe(0);
    expect(await text(page, 'measurement-unit-concentration')).toContain('cm⁻³');
    await page.getByTestId('measurement-notes').fill('e2e: invented profile');
    await page.getByTestId('measurement-upload').click();

    const row = page.locator(`[data-file="${GOOD_FILE}"]`);
    await row.waitFor();
    expect(await fileRows(page).count()).toBe(before + 1);
    const figures = await row.getByTestId('measurement-figures').textContent();

    const xj = page.getByTestId('comparison-xj');
    await page.getByTestId('measurement-comparison').getByText(`newest profile: ${GOOD_FILE}`).waitFor();
    const predicted = numberIn(await xj.getByTestId('comparison-predicted').textContent());
    const measuredText = (await xj.getByTestId('comparison-measured').textContent())!.trim();
    const measured = numberIn(measuredText);
    expect(measured).toBeGreaterThan(1.45);
    expect(measured).toBeLessThan(1.7);
    // The file list shows the same junction the comparison uses.
    expect(figures).toContain(`xj ${measuredText}`);
    // Δ and Δ % agree with the two numbers shown (to the digits shown).
    const delta = numberIn(await xj.getByTestId('comparison-delta').textContent());
    const deltaPct = numberIn(await xj.getByTestId('comparison-delta-pct').textContent());
    expect(delta).toBeCloseTo(measured - predicted, 2);
    expect(deltaPct).toBeCloseTo(((measured - predicted) / predicted) * 100, 0);
    expect(await xj.getByTestId('comparison-verdict').getAttribute('data-verdict')).toBe(Math.abs(deltaPct) <= 10 ? 'in' : 'out');
    // The demo lot's four-point-probe set is still compared, with its statistics.
    expect(numberIn(await text(page, 'probe-mean'))).toBeCloseTo(numberIn(await page.getByTestId('comparison-rs').getByTestId('comparison-measured').textContent()), 1);

    // The overlay: predicted curves and the new measured markers, with both junctions labelled.
    const plot = page.getByTestId('measured-overlay');
    await plot.locator('[data-ready="yes"][data-measured="yes"]').waitFor();
    await plot.locator('.legendtext', { hasText: `measured · ${GOOD_FILE} (SIMS)` }).waitFor();
    await plot.locator('.annotation-text', { hasText: `measured xj ${measuredText}` }).waitFor();
    expect(await plot.locator('.legendtext', { hasText: 'predicted B (p-type)' }).count()).toBe(1);
    expect(await plot.locator('.annotation-text', { hasText: /^predicted xj / }).count()).toBe(1);
    seen.measuredXj = measuredText;
    await shot(page, 'measurements-overlay');
  });

  it('an engineer refits Tube 3 on Calibration and finds the new fit in force at the top of the history', async () => {
    const page = engineer;
    await page.getByRole('link', { name: 'Calibration' }).click();
    await page.getByTestId('calibration').waitFor();
    await page.getByTestId('calibration-tube').click();
    await page.getByRole('option', { name: new RegExp(`^${TUBE}`) }).click();
    await page.getByTestId('calibration-in-force').waitFor();
    const history = page.getByTestId('calibration-history').locator('tbody tr');
    const fitsBefore = await history.count();
    expect(fitsBefore).toBeGreaterThanOrEqual(1);

    const note = `e2e refit after ${GOOD_FILE}`;
    await page.getByTestId('calibration-note').fill(note);
    await page.getByTestId('calibration-fit').click();
    await page.getByTestId('calibration-history-note').filter({ hasText: note }).waitFor();

    expect(await history.count()).toBe(fitsBefore + 1);
    const top = page.getByTestId('calibration-history-row-0');
    expect(await top.getByTestId('calibration-history-note').textContent()).toBe(note);
    expect(await top.getByTestId('calibration-history-in-force').count()).toBe(1);
    // The factor in force is the new fit's, and the new profile is the lot's point in it.
    const factor = numberIn(await text(page, 'calibration-factor'));
    expect(numberIn(await top.getByTestId('calibration-history-factor').textContent())).toBe(factor);
    expect(factor).toBeGreaterThan(0.2);
    expect(factor).toBeLessThan(5);
    expect(numberIn(await text(page, 'calibration-points'))).toBe(3);
    expect(await page.getByTestId(`calibration-lot-${LOT}`).locator('td').nth(1).textContent()).toBe(seen.measuredXj);
    await page.getByTestId('calibration-plot').locator('[data-ready="yes"]').waitFor();
    await shot(page, 'measurements-calibration');
  });

  it('a tube without measured lots is not fitted, and the screen says why', async () => {
    const page = engineer;
    await page.getByTestId('calibration-tube').click();
    await page.getByRole('option', { name: /^Tube 1 · boron/ }).click();
    await page.getByTestId('calibration-none').waitFor();
    await page.getByTestId('calibration-fit').click();
    const refusal = await page.getByTestId('calibration-refusal').textContent();
    expect(refusal).toMatch(/^Not fitted: /);
    expect(refusal).toContain('at least 2 lots');
    expect(await page.getByTestId('calibration-history').count()).toBe(0);
  });
});
