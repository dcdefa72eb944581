import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../../shared/domain/roles';
import { buildPrint } from '../../support/factories';
import {
  signIn,
  startTestApp,
  TEST_PASSWORD,
  type SignedIn,
  type TestApp,
} from '../../support/test-app';
import type { MatrixRow } from './matrix-row';
import { apiRoutesOf, fillPath } from './routes-of-app';

// Every area's rows, however many files there are; a new file is picked up by itself.
const files = import.meta.glob<{ rows: MatrixRow[] }>('./rows/*.ts', { eager: true });
const allRows = Object.entries(files).flatMap(([file, module]) =>
  module.rows.map((row) => ({ ...row, file })),
);
const key = (row: { method: string; path: string }) => `${row.method.toUpperCase()} ${row.path}`;
// Changes that end or spoil records run last, so reads see the seeded records.
const ORDER = { get: 0, post: 1, put: 2, patch: 3, delete: 4 } as const;
const rowsInOrder = [...allRows].sort((a, b) => ORDER[a.method] - ORDER[b.method]);

let t: TestApp;
const agents = new Map<Role, SignedIn>();

async function agentOf(role: Role): Promise<SignedIn> {
  let agent = agents.get(role);
  if (!agent) {
    agent = await signIn(t.app, `${role}@test.example`, TEST_PASSWORD);
    agents.set(role, agent);
  }
  return agent;
}

/** Signing out or a password change ends a session: start a new one for the next row. */
async function keepSignedIn(role: Role): Promise<void> {
  const agent = agents.get(role);
  if (agent && (await agent.get('/api/session')).status === 401) agents.delete(role);
}

function call(test: request.Test, row: MatrixRow): request.Test {
  return row.method === 'get' || row.method === 'delete'
    ? test
    : test.send((row.body ?? {}) as object);
}

async function asRole(row: MatrixRow, role: Role): Promise<number> {
  const agent = await agentOf(role);
  const url = fillPath(row.path, row.params);
  const response = await call(agent.agent[row.method](url).set('X-CSRF-Token', agent.csrf), row);
  if (row.method !== 'get') await keepSignedIn(role);
  return response.status;
}

async function asNobody(row: MatrixRow): Promise<number> {
  const url = fillPath(row.path, row.params);
  return (await call(request(t.app)[row.method](url), row)).status;
}

beforeAll(async () => {
  t = await startTestApp();
  // One record of each kind, so `:id` = 1 names a real record on every route.
  const admin = await t.as('admin');
  const made = [
    await admin.post('/api/papers').send({ name: 'Matrix rag' }),
    await admin.post('/api/negatives').send({ code: 'MX-1', kind: 'glass plate' }),
    await admin.post('/api/locations').send({ code: 'MX', name: 'Matrix room' }),
    await admin
      .post('/api/solution-batches')
      .send({ code: 'MX-B1', kind: 'fixer', chemical: 'sodium thiosulfate' }),
    await admin.post('/api/prints').send(buildPrint({ paperId: 1, negativeId: 1, locationId: 1 })),
  ];
  for (const response of made) expect(response.status, JSON.stringify(response.body)).toBe(201);
  expect(made.map((response) => response.body.id)).toEqual([1, 1, 1, 1, 1]);
});
afterAll(() => t.close());

describe('role matrix: the table and the app agree', () => {
  it('has a row for every route the app registers', () => {
    const rowKeys = new Set(allRows.map(key));
    const missing = apiRoutesOf(t.app)
      .map(key)
      .filter((route) => !rowKeys.has(route));
    expect(missing, 'routes without a row in tests/server/role-matrix/rows/').toEqual([]);
  });

  it('has no row for a route the app does not register, and no row twice', () => {
    const routeKeys = new Set(apiRoutesOf(t.app).map(key));
    expect(allRows.filter((row) => !routeKeys.has(key(row))).map(key)).toEqual([]);
    const keys = allRows.map(key);
    expect(keys.filter((k, i) => keys.indexOf(k) !== i)).toEqual([]);
  });
});

describe('role matrix: every route as nobody and as every role', () => {
  for (const row of rowsInOrder) {
    it(`${key(row)} (${row.file.replace('./rows/', '')})`, async () => {
      const seen: Record<string, number> = { nobody: await asNobody(row) };
      for (const role of ROLES) seen[role] = await asRole(row, role);
      const failures: string[] = [];
      const check = (who: string, ok: boolean, want: string) => {
        if (!ok) failures.push(`${who}: got ${seen[who]}, want ${want}`);
      };
      const open = (status: number) => status !== 401 && status !== 403 && status < 500;
      if (row.allowed === 'anyone') {
        check('nobody', open(seen.nobody!), 'not 401/403/5xx');
      } else {
        check('nobody', seen.nobody === 401, '401');
      }
      for (const role of ROLES) {
        const allowed = row.allowed === 'anyone' || row.allowed.includes(role);
        check(
          role,
          allowed ? open(seen[role]!) : seen[role] === 403,
          allowed ? 'not 401/403/5xx' : '403',
        );
      }
      expect(failures, JSON.stringify(seen)).toEqual([]);
    });
  }
});
