import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { endSessionsOf } from '../../../server/auth/user-sessions';
import { writeTransaction } from '../../../server/db/write-transaction';
import { User } from '../../../server/models';
import { expectProblem } from '../../support/problem';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';

// The session store reads a session from the table once, not on every request, and still
// ends a session at once when its rows are deleted in SQL (deactivation, password change).
let t: TestApp;
const sessionReads: string[] = [];
beforeAll(async () => {
  t = await startTestApp();
  const { options } = t.ctx.sequelize as unknown as { options: { logging: unknown } };
  options.logging = (sql: string) => {
    if (/SELECT .* FROM [`"]sessions[`"]/.test(sql)) sessionReads.push(sql);
  };
});
afterAll(() => t.close());

const idOf = async (email: string) => (await User.findOne({ where: { email } }))!.id;

describe('session reads', () => {
  it('reads a signed-in session from the table once for several requests', async () => {
    const curator = await signIn(t.app, 'curator@test.example', TEST_PASSWORD);
    sessionReads.length = 0;
    for (let i = 0; i < 5; i += 1) expect((await curator.get('/api/session')).status).toBe(200);
    expect(sessionReads).toHaveLength(1);
  });

  it('ends sessions deleted in SQL at once', async () => {
    const viewer = await signIn(t.app, 'viewer@test.example', TEST_PASSWORD);
    expect((await viewer.get('/api/prints')).status).toBe(200);
    await endSessionsOf(t.ctx.sequelize, await idOf('viewer@test.example'));
    expectProblem(await viewer.get('/api/prints'), 401);
  });

  it('ends them once the deleting transaction commits, even if read in between', async () => {
    const conservator = await signIn(t.app, 'conservator@test.example', TEST_PASSWORD);
    const id = await idOf('conservator@test.example');
    // Its first request writes the session's expiry (outside any write transaction).
    expect((await conservator.get('/api/prints')).status).toBe(200);
    await writeTransaction(t.ctx.sequelize, async (transaction) => {
      await endSessionsOf(t.ctx.sequelize, id, { transaction });
      // Not committed yet: this request still finds (and keeps) the session.
      expect((await conservator.get('/api/prints')).status).toBe(200);
    });
    expectProblem(await conservator.get('/api/prints'), 401);
  });
});
