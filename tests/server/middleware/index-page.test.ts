import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../server/app';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';

let t: TestApp;
let app: ReturnType<typeof createApp>;

beforeAll(async () => {
  t = await startTestApp();
  const client = join(t.dir, 'client');
  mkdirSync(client, { recursive: true });
  writeFileSync(
    join(client, 'index.html'),
    '<!doctype html><html><head><title>x</title></head><body></body></html>',
  );
  // What the Vite plugin `routePreloads` writes: each route's page chunks.
  writeFileSync(
    join(client, 'route-preloads.json'),
    JSON.stringify({
      record: ['/assets/print-record-page-abc.js', '/assets/tone-panel-def.js'],
      prints: ['/assets/prints-list-page-abc.js'],
    }),
  );
  app = createApp(t.ctx, { clientDir: client });
});
afterAll(async () => {
  await app.close();
  await t.close();
});

const preloads = (html: string) =>
  [...html.matchAll(/<link rel="(modulepreload|preload)"[^>]*href="([^"]+)"/g)].map(
    (match) => `${match[1]} ${match[2]}`,
  );

describe('the index page', () => {
  it("names a record's code, and to a signed-in person its first answers, in its head", async () => {
    const person = await signIn(app.app, 'conservator@test.example', TEST_PASSWORD);
    const response = await person.get('/prints/12');
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toMatch(/^text\/html/);
    expect(response.headers['cache-control']).toBe('no-cache');
    expect(preloads(response.text)).toEqual([
      'preload /api/prints/12',
      'preload /api/prints/12/tone-checks',
      'preload /api/prints/12/tone-trend',
      'preload /api/prints/12/condition-reports',
      'preload /api/prints/12/treatments',
      'modulepreload /assets/print-record-page-abc.js',
      'modulepreload /assets/tone-panel-def.js',
    ]);
    // Inside the head, where the browser reads them before the body.
    expect(response.text.indexOf('/api/prints/12')).toBeLessThan(response.text.indexOf('</head>'));
  });

  it("leaves out of a viewer's record what a viewer may not read (answered 403)", async () => {
    const person = await signIn(app.app, 'viewer@test.example', TEST_PASSWORD);
    const response = await person.get('/prints/12');
    expect(preloads(response.text)).toEqual([
      'preload /api/prints/12',
      'preload /api/prints/12/tone-checks',
      'preload /api/prints/12/tone-trend',
      'modulepreload /assets/print-record-page-abc.js',
      'modulepreload /assets/tone-panel-def.js',
    ]);
  });

  it('names the plain Prints list as its loader asks for it, and nothing for a filtered one', async () => {
    const person = await signIn(app.app, 'viewer@test.example', TEST_PASSWORD);
    const plain = await person.get('/prints');
    expect(preloads(plain.text)).toContain('preload /api/prints?pageSize=25');
    const filtered = await person.get('/prints?status=on-loan');
    expect(preloads(filtered.text)).toEqual(['modulepreload /assets/prints-list-page-abc.js']);
  });

  it('names no API answers to someone not signed in, only the code', async () => {
    const response = await request(app.app).get('/prints/12');
    expect(preloads(response.text)).toEqual([
      'modulepreload /assets/print-record-page-abc.js',
      'modulepreload /assets/tone-panel-def.js',
    ]);
  });

  it('is the page as built for an address no route preloads', async () => {
    const response = await request(app.app).get('/papers');
    expect(response.status).toBe(200);
    expect(preloads(response.text)).toEqual([]);
    expect(response.text).toContain('<title>x</title>');
  });
});
