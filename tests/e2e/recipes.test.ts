// The recipe workbench end to end in the built app: an engineer composes a
// two-step boron recipe in the forms, watches the predicted junction depth
// follow the anneal time while typing, saves, makes a new version, changes it,
// and compares the two; an operator never sees the draft. Every assertion
// reads what the screen shows.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, shot, signInAs } from '../support/browser';

let browser: Browser;
let engineer: Page;
const recipeName = `E2E boron well ${Date.now().toString(36)}`;
const state: { recipeId?: number; v1?: number; v2?: number; xjV1?: number; xjV2?: number } = {};

beforeAll(async () => {
  browser = await launchBrowser();
  engineer = await browser.newPage({ viewport: { width: 1440, height: 1000 } });
  await signInAs(engineer, inject('baseUrl'), 'engineer');
});
afterAll(async () => {
  await browser?.close();
});

/** The number in a text such as "2.125 µm" or "−0.0412 µm" (Unicode minus included). */
function numberIn(text: string | null): number {
  const match = /[-−+]?\d+(?:\.\d+)?/.exec(text ?? '');
  if (!match) throw new Error(`no number in ${JSON.stringify(text)}`);
  return Number(match[0].replace('−', '-'));
}

const junctionDepth = async (page: Page) => numberIn(await page.getByTestId('outcome-junction-depth').textContent());

async function choose(page: Page, testid: string, option: RegExp) {
  await page.getByTestId(testid).click();
  await page.getByRole('option', { name: option }).click();
  // The overlay fades out; wait so the next select's options are the only ones.
  await page.getByRole('listbox').waitFor({ state: 'detached' });
}

async function addStep(page: Page, kind: string) {
  await page.getByTestId('step-add').click();
  await page.getByTestId(`step-add-${kind}`).click();
}

const versionInUrl = (page: Page) => Number(new URL(page.url()).searchParams.get('version'));

describe('recipe workbench', () => {
  it('an engineer creates a recipe from the Bench and composes a boron predeposition and anneal in the forms', async () => {
    const page = engineer;
    expect(new URL(page.url()).pathname).toBe('/bench');
    await page.getByTestId('bench-new-recipe').click();
    await page.getByTestId('create-name').fill(recipeName);
    await page.getByTestId('create-description').fill('Boron well: predeposition then drive-in (e2e)');
    await page.getByTestId('create-submit').click();
    await page.getByTestId('workspace').waitFor();
    state.recipeId = Number(/\/recipes\/(\d+)/.exec(page.url())![1]);

    await page.getByTestId('field-substrate.type').getByText('n-type').click();
    await addStep(page, 'predeposition');
    await addStep(page, 'anneal');
    await choose(page, 'field-steps.0.tubeId', /Tube 1 · boron/);
    await choose(page, 'field-steps.1.tubeId', /Tube 3 · anneal/);

    await expect.poll(() => page.getByTestId('step-list').locator('[data-testid^="step-"][data-kind]').count()).toBe(2);
    await expect.poll(() => page.getByTestId('tube-banner').count()).toBe(0);
    await expect.poll(() => junctionDepth(page)).toBeGreaterThan(0.3);
    expect(await page.getByTestId('outcome-sheet-resistance').textContent()).toMatch(/Ω\/□/);
    expect(await page.getByTestId('step-table').textContent()).toContain('Anneal / drive-in');
    await shot(page, 'recipes-composed');
  });

  it('the junction depth follows the anneal time while the engineer types', async () => {
    const page = engineer;
    const at60 = await junctionDepth(page);
    const time = page.getByTestId('field-steps.1.timeMin');
    await time.fill('');
    await expect.poll(() => page.getByTestId('error-steps.1.timeMin').textContent()).toMatch(/time/i);

    await time.press('1'); // 1 min
    await expect.poll(() => junctionDepth(page)).toBeLessThan(at60);
    const at1 = await junctionDepth(page);
    await time.press('2'); // 12 min
    await expect.poll(() => junctionDepth(page)).toBeGreaterThan(at1);
    await time.press('0'); // 120 min
    await expect.poll(() => junctionDepth(page)).toBeGreaterThan(at60);
    expect(await page.getByTestId('error-steps.1.timeMin').count()).toBe(0);
    state.xjV1 = await junctionDepth(page);
  });

  it('saves the draft, which bumps its revision and clears the unsaved flag', async () => {
    const page = engineer;
    await page.getByTestId('version-note').fill('Two-hour drive-in');
    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('version-revision').textContent()).toBe('2');
    expect(await page.getByTestId('dirty-flag').count()).toBe(0);
    // The server's stored result agrees with the browser's preview.
    expect(await junctionDepth(page)).toBeCloseTo(state.xjV1!, 3);
    state.v1 = versionInUrl(page) || Number(await page.getByTestId('workspace').getAttribute('data-version'));
  });

  it('makes a new version from it, changes the anneal temperature and saves that too', async () => {
    const page = engineer;
    await page.getByTestId('copy-version').click();
    await expect.poll(() => versionInUrl(page)).not.toBe(state.v1);
    await expect.poll(() => page.getByTestId('version-picker').textContent()).toContain('Version 2');
    state.v2 = versionInUrl(page);

    await page.getByTestId('field-steps.1.tempC').fill('1050');
    await expect.poll(() => junctionDepth(page)).toBeLessThan(state.xjV1!);
    state.xjV2 = await junctionDepth(page);
    await page.getByTestId('save').click();
    await expect.poll(() => page.getByTestId('version-revision').textContent()).toBe('2');
    await shot(page, 'recipes-version-2');
  });

  it('compares the two versions and reads Δ junction depth on screen', async () => {
    const page = engineer;
    await page.goto(`${inject('baseUrl')}/compare?a=${state.v1}&b=${state.v2}`);
    await page.getByTestId('compare-deltas').waitFor();
    const delta = numberIn(await page.getByTestId('delta-junction-depth').textContent());
    expect(delta).toBeLessThan(0);
    expect(delta).toBeCloseTo(state.xjV2! - state.xjV1!, 2);
    expect(await page.getByTestId('delta-sheet-resistance').textContent()).toMatch(/Ω\/□ \([+−]\d/);
    const changedB = page.getByTestId('compare-step-1-b');
    expect(await changedB.getAttribute('data-status')).toBe('changed');
    expect(await changedB.locator('dd.hl[data-field="tempC"]').textContent()).toBe('1050');
    await page.getByTestId('profile-plot').locator('[data-ready="yes"]').waitFor();
    await shot(page, 'recipes-compare');
  });

  it('an operator does not see the draft in Recipes and cannot open it', async () => {
    const page = await browser.newPage();
    await signInAs(page, inject('baseUrl'), 'operator');
    await page.getByTestId('nav-recipes').click();
    await page.getByTestId('recipe-table').waitFor();
    await page.getByTestId('filter-name').fill(recipeName);
    await expect.poll(() => page.getByTestId('recipe-table').textContent()).toContain('No recipe matches');
    await page.goto(`${inject('baseUrl')}/recipes/${state.recipeId}`);
    await expect.poll(() => page.getByTestId('workspace-error').textContent()).toMatch(/not found/i);
    await page.close();
  });
});
