import fc from 'fast-check';
import type { Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { backgroundSettled } from '../../support/background';
import { startTestApp, type SignedIn, type TestApp } from '../../support/test-app';
import { apiRoutesOf, fillPath } from '../role-matrix/routes-of-app';
import { jsonBody, listQuery, malformedJson, pathParam } from './arbitraries';
import { digestTables } from './table-digest';

let t: TestApp;
let admin: SignedIn;

beforeAll(async () => {
  t = await startTestApp({ resetRequests: 1_000_000, signInAttempts: 1_000_000 });
  admin = await t.as('admin');
  await admin.post('/api/papers').send({ name: 'Fuzz rag' });
  await admin.post('/api/prints').send(buildPrint({ paperId: 1 }));
});
afterAll(() => t.close());

/** Nothing that reveals the inside: stack frames, SQL, file paths. */
const LEAK =
  /\bat \S+ \(|\bSQLITE_|\bSELECT\b|\bINSERT INTO\b|\/work\/|\/tmp\/|node_modules|\.ts:\d+/;

/** A refused request: a 4xx problem document. A 2xx (valid by chance) may change things. */
async function expectSafe(response: Response, before: string): Promise<string> {
  const where = `${response.status} ${JSON.stringify(response.body)}`;
  expect(response.status, where).toBeLessThan(500);
  expect(response.text ?? '', where).not.toMatch(LEAK);
  // Work an earlier accepted request left running must not count against this one.
  await backgroundSettled(t.ctx);
  const after = await digestTables(t.ctx.sequelize);
  if (response.status >= 400) {
    expect(response.headers['content-type'], where).toMatch(/^application\/problem\+json/);
    expect(response.body.status).toBe(response.status);
    expect(after, `a refused request changed the database: ${where}`).toBe(before);
  }
  return after;
}

/** Every state-changing route the app registers, but signing out (it has no input). */
function changingRoutes() {
  return apiRoutesOf(t.app).filter(
    (route) =>
      route.method !== 'get' && !(route.method === 'delete' && route.path === '/api/session'),
  );
}

const send = (method: string, url: string) =>
  admin.agent[method as 'post'](url).set('X-CSRF-Token', admin.csrf);

// Thousands of requests on a shared two-core machine: a generous timeout, not a timing check.
describe('bad input on purpose (fast-check)', { timeout: 120_000 }, () => {
  it('every state-changing route answers random bodies and ids with a 4xx and changes nothing', async () => {
    await backgroundSettled(t.ctx);
    let digest = await digestTables(t.ctx.sequelize);
    const routes = changingRoutes();
    expect(routes.length).toBeGreaterThan(20);
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(...routes),
        pathParam,
        jsonBody,
        fc.boolean(),
        async (route, param, body, encoded) => {
          const url = fillPath(
            route.path,
            Object.fromEntries([...route.path.matchAll(/:(\w+)/g)].map((m) => [m[1]!, param])),
          );
          // fillPath encodes; send the generated text raw so odd encodings reach the router.
          const raw = route.path.replace(/:(\w+)/g, param);
          const response = await send(route.method, encoded ? url : raw)
            .set('Content-Type', 'application/json')
            .send(JSON.stringify(body) ?? 'null');
          digest = await expectSafe(response, digest);
        },
      ),
      { numRuns: 700 },
    );
  });

  it('malformed JSON and wrong content types are 4xx problems', async () => {
    await backgroundSettled(t.ctx);
    let digest = await digestTables(t.ctx.sequelize);
    const routes = changingRoutes();
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(...routes),
        malformedJson,
        fc.constantFrom(
          'application/json',
          'text/plain',
          'application/x-www-form-urlencoded',
          'application/json; charset=latin1',
        ),
        async (route, text, type) => {
          const response = await send(route.method, fillPath(route.path))
            .set('Content-Type', type)
            .send(text);
          digest = await expectSafe(response, digest);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('the list answers any query with 200 or a 4xx problem, never a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(listQuery, async (query) => {
        const response = await admin.get(`/api/prints?${query}`);
        expect(response.text).not.toMatch(LEAK);
        if (response.status !== 200) {
          expect(response.status, `${query} → ${response.text}`).toBeGreaterThanOrEqual(400);
          expect(response.status, `${query} → ${response.text}`).toBeLessThan(500);
          expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
        }
      }),
      { numRuns: 300 },
    );
  });
});
