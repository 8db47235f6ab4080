// Debian's chromium driven by playwright-core (never a downloaded browser).
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { DEMO_PEOPLE } from '../../server/db/seed';
import type { Role } from '../../shared/schemas/users';

export const SHOTS_DIR = join(process.cwd(), 'tests', '.artifacts');

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
      '--no-first-run',
      '--disable-quic',
    ],
  });
}

/** Signs in through the form as the demo person of `role`. */
export async function signInAs(page: Page, baseUrl: string, role: Role): Promise<void> {
  const person = DEMO_PEOPLE.find((p) => p.role === role)!;
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByTestId('sign-in-email').fill(person.email);
  await page.getByTestId('sign-in-password').fill(person.password);
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('current-user').waitFor();
}

/** Saves a screenshot under tests/.artifacts (git-ignored) for a person to look at. */
export async function shot(page: Page, name: string): Promise<void> {
  mkdirSync(SHOTS_DIR, { recursive: true });
  await page.screenshot({ path: join(SHOTS_DIR, `${name}.png`), fullPage: true });
}
