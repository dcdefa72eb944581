import { QueryTypes, UniqueConstraintError } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../../../shared/domain/roles';
import { User } from '../../../../server/models';
import { createPrint } from '../../../../server/services/prints/create-print';
import { PrintCreateSchema } from '../../../../shared/schemas/print';
import { buildPrint } from '../../../support/factories';
import { feedRowsSince, lastFeedId } from '../../../support/change-feed';
import { startTestApp, type TestApp } from '../../../support/test-app';

// Creates that arrive while the write lock is taken are written in one transaction (group
// commit). Each must still answer for itself: its own number, its own refusal, its own
// creator, found by the next search.
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const contextOf = async (role: Role) => ({
  ...t.ctx,
  user: (await User.findOne({ where: { email: `${role}@test.example` } }))!,
});

/** A print as the route hands it on: the form's body after validation. */
const newPrint = (fields: Parameters<typeof buildPrint>[0] = {}) =>
  PrintCreateSchema.parse(buildPrint(fields));

const settled = <T>(promises: Array<Promise<T>>) => Promise.allSettled(promises);

describe('creates made at the same moment', () => {
  it('are written in one transaction, numbered in the order they came, each found by the next search', async () => {
    const archivist = await contextOf('archivist');
    const before = await lastFeedId(t.ctx.sequelize);
    const created = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        createPrint(archivist, newPrint({ title: `Together ${i}` })),
      ),
    );
    // One change-feed row per transaction: one for all ten, not ten.
    expect(await feedRowsSince(t.ctx.sequelize, before)).toBe(1);
    const sequences = created.map(({ print }) => Number(print.accessionNumber.split('.')[1]));
    expect(sequences).toEqual(sequences.map((_, i) => sequences[0]! + i));
    expect(created.map(({ print }) => print.title)).toEqual(
      Array.from({ length: 10 }, (_, i) => `Together ${i}`),
    );
    const found = await (await t.as('curator')).get('/api/prints?q=together&pageSize=50');
    expect(found.body.total).toBe(10);
  });

  it('refuse only the create that names a missing paper or a number already taken', async () => {
    const archivist = await contextOf('archivist');
    const taken = (await createPrint(archivist, newPrint({ accessionNumber: '2011.0007' }))).print;
    const outcomes = await settled([
      createPrint(archivist, newPrint({ title: 'Good one' })),
      createPrint(archivist, newPrint({ title: 'Missing paper', paperId: 999_999 })),
      createPrint(archivist, newPrint({ title: 'Good two' })),
      createPrint(
        archivist,
        newPrint({ title: 'Number taken', accessionNumber: taken.accessionNumber }),
      ),
      createPrint(archivist, newPrint({ title: 'Good three' })),
    ]);
    expect(outcomes.map((outcome) => outcome.status)).toEqual([
      'fulfilled',
      'rejected',
      'fulfilled',
      'rejected',
      'fulfilled',
    ]);
    // A problem carries its status; PostgreSQL's unique failure reaches the error handler as
    // Sequelize's own error, which it answers with 409.
    const statusOf = (outcome: PromiseSettledResult<unknown>) => {
      const reason = (outcome as PromiseRejectedResult).reason;
      return reason instanceof UniqueConstraintError ? 409 : reason.status;
    };
    expect(statusOf(outcomes[1]!)).toBe(422);
    expect(statusOf(outcomes[3]!)).toBe(409);
    const titles = await t.ctx.sequelize.query<{ title: string }>(
      "SELECT title FROM prints WHERE title IN ('Missing paper', 'Number taken', 'Good one', 'Good two', 'Good three') ORDER BY title",
      { type: QueryTypes.SELECT },
    );
    expect(titles.map(({ title }) => title)).toEqual(['Good one', 'Good three', 'Good two']);
  });

  it('keep each print’s own creator when two people create at once', async () => {
    const [archivist, admin] = await Promise.all([contextOf('archivist'), contextOf('admin')]);
    const [mine, theirs] = await Promise.all([
      createPrint(archivist, newPrint({ title: 'By the archivist' })),
      createPrint(admin, newPrint({ title: 'By the admin' })),
    ]);
    const creators = await t.ctx.sequelize.query<{
      id: number;
      created_by: number;
      user_id: number;
    }>(
      `SELECT p.id, p.created_by, a.user_id FROM prints p
         JOIN audit_events a ON a.entity = 'print' AND a.entity_id = p.id AND a.action = 'create'
        WHERE p.id IN (?, ?) ORDER BY p.id`,
      { replacements: [mine.print.id, theirs.print.id], type: QueryTypes.SELECT },
    );
    expect(creators.map(({ created_by, user_id }) => [created_by, user_id])).toEqual([
      [archivist.user.id, archivist.user.id],
      [admin.user.id, admin.user.id],
    ]);
  });
});
