// The chain end to end in a browser: an engineer submits a draft, a lead signs
// it from the sign-off queue with password and stated meaning, and an operator
// opens a lot against the new release and prints its run traveller.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, shot, signInAs } from '../support/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const base = () => inject('baseUrl');

/** The demo recipe whose newest version is the engineer's draft (demo scenario). */
async function baseDiffusion(page: Page): Promise<{ recipeId: number; draftId: number }> {
  return page.evaluate(async () => {
    const list = (await (await fetch('/api/recipes?name=Base%20diffusion')).json()) as { data: { rows: Array<{ id: number }> } };
    const recipe = list.data.rows[0];
    const detail = (await (await fetch(`/api/recipes/${recipe.id}`)).json()) as { data: { versions: Array<{ id: number; state: string }> } };
    const draft = detail.data.versions.find((v) => v.state === 'draft')!;
    return { recipeId: recipe.id, draftId: draft.id };
  });
}

describe('sign-off and lots in the browser', () => {
  let ids: { recipeId: number; draftId: number };
  const lotCode = `E2E-${Date.now().toString(36).toUpperCase()}`;

  it('an engineer submits their draft for sign-off from the Recipe workspace', async () => {
    const page = await browser.newPage();
    await signInAs(page, base(), 'engineer');
    ids = await baseDiffusion(page);
    await page.goto(`${base()}/recipes/${ids.recipeId}?version=${ids.draftId}`);
    await page.locator('[data-testid="signoff-status"][data-state="draft"]').waitFor();
    await page.getByTestId('signoff-submit').click();
    await page.getByTestId('submit-note').fill('Deeper junction for the new mask set');
    await page.getByTestId('submit-confirm').click();
    await page.locator('[data-testid="signoff-status"][data-state="in_review"]').waitFor();
    expect(await page.getByTestId('signoff-submit').count()).toBe(0);
    await shot(page, 'signoff-submitted');
    await page.close();
  });

  it('a lead signs it from the queue, after a wrong password is refused', async () => {
    const page = await browser.newPage();
    await signInAs(page, base(), 'lead');
    await page.getByTestId('nav-sign-off').click();
    const sign = page.getByTestId(`queue-sign-${ids.draftId}`);
    await sign.click();
    await page.getByTestId('sign-meaning-approved-for-production').click();
    await page.getByTestId('sign-password').fill('not-my-password');
    await page.getByTestId('sign-submit').click();
    await expect.poll(() => page.getByTestId('sign-password-error').textContent()).toMatch(/password is wrong/i);
    expect(await page.getByTestId('sign-statement').textContent()).toMatch(/electronic signature.*content hash/s);
    await page.getByTestId('sign-password').fill('demo-lead-pass');
    await page.getByTestId('sign-submit').click();
    await page.getByTestId('sign-dialog').waitFor({ state: 'detached' });
    await sign.waitFor({ state: 'detached' });
    await page.goto(`${base()}/recipes/${ids.recipeId}?version=${ids.draftId}`);
    await expect.poll(() => page.getByTestId('release-signature').textContent()).toMatch(/Signed by .+ approved for production/);
    await shot(page, 'signoff-released');
    await page.close();
  });

  it('an operator opens a lot against the release and prints its traveller as a PDF', async () => {
    const page = await browser.newPage();
    await signInAs(page, base(), 'operator');
    await page.getByTestId('lots-view').waitFor(); // Lots is the operator's home
    await page.getByTestId('lot-open').click();
    await page.getByTestId('lot-code').fill(lotCode);
    await page.locator('#lot-version').fill('Base diffusion');
    await page.getByRole('option', { name: /Base diffusion .* released v3/ }).click();
    await page.getByTestId('lot-version-summary').waitFor();
    await page.getByTestId('lot-open-submit').click();
    await page.locator(`[data-testid="lot-detail"][data-lot="${lotCode}"]`).waitFor();
    expect(await page.getByTestId('lot-targets').textContent()).toMatch(/Junction depth.*µm.*± 10 %/s);
    expect(await page.getByTestId('caution').textContent()).toMatch(/Hot furnace.*BBr3.*EHS/s);

    const href = await page.getByTestId('lot-print').getAttribute('href');
    const pdf = await page.evaluate(async (url) => {
      const res = await fetch(url!);
      const head = new TextDecoder().decode((await res.arrayBuffer()).slice(0, 5));
      return { status: res.status, type: res.headers.get('content-type'), head };
    }, href);
    expect(pdf).toEqual({ status: 200, type: 'application/pdf', head: '%PDF-' });
    await shot(page, 'lot-opened');
    await page.close();
  });
});
