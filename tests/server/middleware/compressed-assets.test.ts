import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../server/app';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';

let t: TestApp;
let app: ReturnType<typeof createApp>;
const script = `export const words = ${JSON.stringify('salt print '.repeat(2000))};\n`;

beforeAll(async () => {
  t = await startTestApp();
  const client = join(t.dir, 'client');
  mkdirSync(join(client, 'assets'), { recursive: true });
  writeFileSync(join(client, 'index.html'), '<!doctype html><title>x</title>');
  writeFileSync(join(client, 'assets', 'page-abc123.js'), script);
  app = createApp(t.ctx, { clientDir: client });
});
afterAll(async () => {
  await app.close();
  await t.close();
});

describe('built client assets', () => {
  it('are sent gzipped to a browser that accepts it, cached for a year', async () => {
    const response = await request(app.app)
      .get('/assets/page-abc123.js')
      .set('Accept-Encoding', 'gzip, deflate, br');
    expect(response.status).toBe(200);
    expect(response.headers['content-encoding']).toBe('gzip');
    expect(response.headers['content-type']).toMatch(/^text\/javascript/);
    expect(response.headers['cache-control']).toContain('immutable');
    // What went over the wire is the compressed length; supertest hands back the unzipped text.
    expect(Number(response.headers['content-length'])).toBeLessThan(script.length / 10);
    expect(response.text).toBe(script);
  });

  it('are sent as they are to a client that does not accept gzip', async () => {
    const response = await request(app.app)
      .get('/assets/page-abc123.js')
      .set('Accept-Encoding', 'identity');
    expect(response.status).toBe(200);
    expect(response.headers['content-encoding']).toBeUndefined();
    expect(response.text).toBe(script);
  });

  it('are served before sessions: a signed-in browser gets no session cookie with them', async () => {
    // Sessions roll (every answer through them renews the cookie), so a file answered after
    // the session was read would carry Set-Cookie; read there, each file waited on the database.
    const signedIn = await signIn(app.app, 'curator@test.example', TEST_PASSWORD);
    const page = await signedIn.get('/prints');
    expect(page.headers['set-cookie']).toBeDefined();
    for (const encoding of ['gzip', 'identity']) {
      const file = await signedIn.agent
        .get('/assets/page-abc123.js')
        .set('Accept-Encoding', encoding);
      expect(file.status).toBe(200);
      expect(file.headers['set-cookie']).toBeUndefined();
    }
  });

  it('never reach outside the assets folder', async () => {
    const response = await request(app.app)
      .get('/assets/..%2f..%2fclient/index.html.js')
      .set('Accept-Encoding', 'gzip');
    expect(response.headers['content-encoding']).toBeUndefined();
  });
});
