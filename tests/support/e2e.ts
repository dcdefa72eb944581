import { AxeBuilder } from '@axe-core/playwright';
import type { BrowserContext, Page } from 'playwright-core';
import { expect } from 'vitest';

/** The demo password of every demo account (contract: demo accounts). */
export const DEMO_PASSWORD = 'printwarden-demo';

/**
 * Signs in through the form as the demo account of a role, signed out first. Earlier pages
 * are closed before the cookies are cleared: a request still in flight from one of them
 * would otherwise bring its rolling session cookie back and skip the sign-in form.
 */
export async function signInAs(context: BrowserContext, baseUrl: string, role: string) {
  await Promise.all(context.pages().map((open) => open.close()));
  await context.clearCookies();
  const page = await context.newPage();
  await page.goto(`${baseUrl}/sign-in`);
  const email = page.getByLabel('E-mail');
  // Right after a long test the form has been seen not to appear at all (cause not yet
  // found, see DEVELOPERS.md); one reload brings it.
  if (
    !(await email.waitFor({ timeout: 10_000 }).then(
      () => true,
      () => false,
    ))
  ) {
    await page.reload();
  }
  await email.fill(`${role}@printwarden.test`);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Prints', level: 1 }).waitFor();
  return page;
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
