import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

describe('the sign-in form', () => {
  it('loads its checks only when sent, names what is wrong, and signs in once mended', async () => {
    const page = await live.browser.freshPage({ viewport: { width: 390, height: 844 } });
    const scripts: string[] = [];
    const sessionPosts: string[] = [];
    page.on('request', (request) => {
      if (request.resourceType() === 'script') scripts.push(request.url());
      if (request.method() === 'POST' && request.url().endsWith('/api/session'))
        sessionPosts.push(request.url());
    });
    await page.goto(`${live.server.url}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    const loadedBeforeSending = scripts.length;

    await page.getByLabel('E-mail').fill('not an address');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Enter an e-mail address').waitFor();
    await page.getByText('Enter your password').waitFor();
    // The shared schema (and zod) came with the first send, not with the page.
    expect(scripts.length).toBeGreaterThan(loadedBeforeSending);
    expect(sessionPosts).toHaveLength(0);

    await page.getByLabel('E-mail').fill('conservator@printwarden.test');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Today', level: 1 }).waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
    expect(sessionPosts).toHaveLength(1);
    await page.close();
  }, 60_000);

  it('still signs in when the checks cannot be fetched (a page left open across a release)', async () => {
    const page = await live.browser.freshPage({ viewport: { width: 1400, height: 900 } });
    await page.route(/\/assets\/session-[^/]*\.js$/, (route) => route.abort());
    await page.goto(`${live.server.url}/sign-in`);
    await page.getByLabel('E-mail').fill('curator@printwarden.test');
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    // The server checks instead, and its answer is shown.
    await page.getByText('Wrong e-mail or password.').waitFor();
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Today', level: 1 }).waitFor();
    await page.close();
  }, 60_000);
});
