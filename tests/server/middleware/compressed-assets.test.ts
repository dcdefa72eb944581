import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../server/app';
import { startTestApp, type TestApp } from '../../support/test-app';

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

  it('never reach outside the assets folder', async () => {
    const response = await request(app.app)
      .get('/assets/..%2f..%2fclient/index.html.js')
      .set('Accept-Encoding', 'gzip');
    expect(response.headers['content-encoding']).toBeUndefined();
  });
});
