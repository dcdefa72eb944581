import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import type { TestBrowser } from './browser';

/** The demo password of every demo account (contract: demo accounts). */
export const DEMO_PASSWORD = 'printwarden-demo';

/** Signs in through the form, in a browser context of its own (see `freshPage`). */
export async function signInWith(
  browser: TestBrowser,
  baseUrl: string,
  email: string,
  password: string,
): Promise<Page> {
  const page = await browser.freshPage();
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Prints', level: 1 }).waitFor();
  return page;
}

/** Signs in as the demo account of a role. */
export function signInAs(browser: TestBrowser, baseUrl: string, role: string): Promise<Page> {
  return signInWith(browser, baseUrl, `${role}@printwarden.test`, DEMO_PASSWORD);
}

/** axe-core on the page as it stands; serious and critical findings fail the test. */
export async function expectAccessible(page: Page): Promise<void> {
  const results = await new AxeBuilder({ page }).analyze();
  const serious = results.violations.filter(
    (v) => v.impact === 'serious' || v.impact === 'critical',
  );
  expect(
    serious.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`),
  ).toEqual([]);
}
