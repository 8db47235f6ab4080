// Each role signs in through the form and sees the navigation its role allows;
// a screen the role may not use shows the Not allowed view.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Browser } from 'playwright-core';
import { ROLES, type Role } from '../../shared/schemas/users';
import { launchBrowser, shot, signInAs } from '../support/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Navigation each role must see, by route name (later screens add to these lists). */
const EXPECTED_NAV: Record<Role, string[]> = {
  engineer: ['bench', 'lots', 'recipes', 'compare', 'tubes', 'calibration'],
  lead: ['bench', 'lots', 'recipes', 'compare', 'sign-off', 'tubes', 'calibration', 'audit'],
  operator: ['lots', 'recipes', 'tubes'],
  admin: ['bench', 'lots', 'recipes', 'compare', 'sign-off', 'tubes', 'calibration', 'people', 'audit', 'outbox'],
};

describe('app shell', () => {
  it.each(ROLES)('%s signs in and sees the navigation of the role', async (role) => {
    const page = await browser.newPage();
    await signInAs(page, inject('baseUrl'), role);
    await expect.poll(() => page.getByTestId('current-user').textContent()).toMatch(new RegExp(role, 'i'));
    const nav = await page.locator('[data-testid^="nav-"]').evaluateAll((els) => els.map((e) => e.getAttribute('data-testid')!.slice(4)));
    expect(nav).toEqual(EXPECTED_NAV[role]);
    await shot(page, `shell-${role}`);
    await page.close();
  });

  it('a non-admin opening People sees Not allowed; signing out returns to sign-in', async () => {
    const page = await browser.newPage();
    await signInAs(page, inject('baseUrl'), 'operator');
    await page.goto(`${inject('baseUrl')}/people`);
    await page.getByTestId('not-allowed').waitFor();
    expect(await page.getByTestId('not-allowed').textContent()).toMatch(/admin/i);
    await page.getByTestId('sign-out').click();
    await page.getByTestId('sign-in-email').waitFor();
    expect(page.url()).toContain('/sign-in');
    await page.close();
  });

  it('an admin creates a person in the People screen', async () => {
    const page = await browser.newPage();
    await signInAs(page, inject('baseUrl'), 'admin');
    await page.getByTestId('nav-people').click();
    await page.getByTestId('person-new').click();
    await page.getByTestId('person-email').fill('new.tech@pilotline.example');
    await page.getByTestId('person-name').fill('New Technician');
    await page.getByTestId('person-role').click();
    await page.getByRole('option', { name: /operator/i }).click();
    await page.getByTestId('person-password').fill('a-long-enough-pass');
    await page.getByTestId('person-save').click();
    await expect.poll(() => page.getByTestId('person-table').textContent()).toContain('new.tech@pilotline.example');
    await shot(page, 'people-admin');
    await page.close();
  });
});
