import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, DEMO_USERS } from '../../seeds/demo-reference';
import { launchBrowser, type TestBrowser } from '../support/browser';
import { expectAccessible } from '../support/e2e';
import { runCreateAdmin, startChildServer, type ChildServer } from '../support/child-server';

const dir = mkdtempSync(join(tmpdir(), 'printwarden-first-run-'));
const ADMIN = {
  email: 'keeper@example.org',
  name: 'Ana Keeper',
  password: 'a real admin password',
};
let browser: TestBrowser;
let server: ChildServer;
let env: Record<string, string>;

/** A port nobody uses now, so PUBLIC_URL can name it before the server starts. */
function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

/** The compiled `create-admin` under plain node, as a production machine runs it. */
function createAdmin() {
  return runCreateAdmin(
    ['--email', ADMIN.email, '--name', ADMIN.name],
    `${ADMIN.password}\n`,
    env,
    { entry: 'compiled' },
  );
}

beforeAll(async () => {
  const port = await freePort();
  env = {
    NODE_ENV: 'production',
    PORT: String(port),
    PUBLIC_URL: `http://127.0.0.1:${port}`,
    SESSION_SECRET: 'first-run-secret',
    DATABASE_URL: `sqlite:${join(dir, 'archive.sqlite')}`,
    DATA_DIR: dir,
    UPLOADS_DIR: join(dir, 'uploads'),
    PASSWORD_COST: '4',
  };
  server = await startChildServer(env, { entry: 'compiled' });
  browser = await launchBrowser();
}, 60_000);

afterAll(async () => {
  await browser?.close();
  if (server && server.child.exitCode === null) {
    server.child.kill('SIGTERM');
    await server.exited;
  }
  rmSync(dir, { recursive: true, force: true });
});

describe('a new archive, production build, demo off', () => {
  it('goes from an empty database to a first admin who invites a curator', async () => {
    // The cookie is Secure in production; the TLS proxy in front says the request was https.
    const page = await browser.freshPage({ extraHTTPHeaders: { 'X-Forwarded-Proto': 'https' } });
    await page.goto(`${server.url}/sign-in`);
    await page.getByRole('heading', { name: 'No accounts yet' }).waitFor();
    await expect.poll(() => page.getByText('npm run create-admin').count()).toBe(1);
    await expect.poll(() => page.getByText('printwarden-demo').count()).toBe(0);
    await expectAccessible(page);

    const made = await createAdmin();
    expect(made.code, made.stdout + made.stderr).toBe(0);

    await page.reload();
    await page.getByLabel('E-mail').fill(ADMIN.email);
    await page.getByLabel('Password').fill(ADMIN.password);
    const signedIn = page.waitForResponse((r) => r.url().endsWith('/api/session'));
    await page.getByRole('button', { name: 'Sign in' }).click();
    expect((await signedIn).status()).toBe(200);
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));

    await page.goto(`${server.url}/people`);
    const form = page.getByRole('form', { name: 'Invite a colleague' });
    await form.getByLabel('E-mail').fill('curator@example.org');
    await form.getByLabel('Role').selectOption('curator');
    const invited = page.waitForResponse(
      (r) => r.request().method() === 'POST' && r.url().endsWith('/api/users/invitations'),
    );
    // A forged Host must not steer the link: it is built from PUBLIC_URL alone.
    await page.setExtraHTTPHeaders({
      'X-Forwarded-Proto': 'https',
      'X-Forwarded-Host': 'evil.example',
    });
    await form.getByRole('button', { name: 'Send invitation' }).click();
    expect((await invited).status()).toBe(201);

    const outbox = await page.evaluate(async () => {
      for (let attempt = 0; attempt < 50; attempt += 1) {
        const body = (await (await fetch('/api/outbox')).json()) as {
          messages: Array<{ to: string; text: string }>;
        };
        const message = body.messages.find((m) => m.to.includes('curator@example.org'));
        if (message) return message.text;
        await new Promise((resolve) => setTimeout(resolve, 100));
      }
      return null;
    });
    expect(outbox).toContain(`${env.PUBLIC_URL}/`);
  });

  it('lets the demo password open no account', async () => {
    for (const { email } of DEMO_USERS) {
      const response = await fetch(`${server.url}/api/session`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'x-forwarded-proto': 'https' },
        body: JSON.stringify({ email, password: DEMO_PASSWORD }),
      });
      expect(response.status, email).toBe(401);
    }
  });

  it('runs the compiled server under plain node and stops with exit 0', async () => {
    expect(server.child.spawnargs).toContain('dist/server/index.js');
    server.child.kill('SIGTERM');
    expect(await server.exited).toBe(0);
  });
});
