import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ToneCheckCreateSchema } from '../../../../shared/schemas/tone';
import { User } from '../../../../server/models';
import { createToneCheck } from '../../../../server/services/tone/tone-checks';
import { buildPrint } from '../../../support/factories';
import { feedRowsSince, lastFeedId } from '../../../support/change-feed';
import { startTestApp, type TestApp } from '../../../support/test-app';
import { buildReadings, buildToneCheck } from '../../../support/tone-factories';

// Checks logged at the same moment are written in one transaction (group commit). The
// prints must end exactly as if the checks had been logged one after another, and each
// check must still be answered, or refused, on its own.
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

async function newPrint(title: string): Promise<number> {
  const created = await (
    await t.as('archivist')
  )
    .post('/api/prints')
    .send(buildPrint({ title, madeOn: '2024-01-10' }));
  expect(created.status).toBe(201);
  return created.body.id as number;
}

const conservator = async () => ({
  ...t.ctx,
  user: (await User.findOne({ where: { email: 'conservator@test.example' } }))!,
});

/** A baseline, then a yellowed check two years on: the print's state moves to yellowing. */
const CHECKS = [
  ToneCheckCreateSchema.parse(buildToneCheck({ baseline: true })),
  ToneCheckCreateSchema.parse(
    buildToneCheck({ checkedOn: '2026-03-02', readings: buildReadings({ dminB: 7.2 }) }),
  ),
];

async function storedTone(id: number) {
  const [row] = await t.ctx.sequelize.query<Record<string, unknown>>(
    `SELECT tone_status, tone_flags, tone_urgency, next_check_due, tone_baseline_on,
            tone_rate_per_year, tone_sparkline FROM prints WHERE id = ?`,
    { replacements: [id], type: QueryTypes.SELECT },
  );
  return row;
}

describe('tone checks logged at the same moment', () => {
  it('leave each print as the same checks logged one after another would', async () => {
    const ctx = await conservator();
    const oneByOne = await newPrint('Checked one by one');
    for (const check of CHECKS) await createToneCheck(ctx, oneByOne, check);

    const [first, second] = [
      await newPrint('Checked at once A'),
      await newPrint('Checked at once B'),
    ];
    const before = await lastFeedId(t.ctx.sequelize);
    const answers = await Promise.all([
      createToneCheck(ctx, first, CHECKS[0]!),
      createToneCheck(ctx, second, CHECKS[0]!),
      createToneCheck(ctx, first, CHECKS[1]!),
      createToneCheck(ctx, second, CHECKS[1]!),
    ]);
    // One transaction, so one change-feed row, for all four.
    expect(await feedRowsSince(t.ctx.sequelize, before)).toBe(1);
    expect(new Set(answers.map((answer) => answer.id)).size).toBe(4);
    expect(answers.map((answer) => answer.tone.status)).toEqual([
      'yellowing',
      'yellowing',
      'yellowing',
      'yellowing',
    ]);
    const dmin = answers[2]!.comparison.find((row) => row.patch === 'dmin')!;
    expect(dmin.db).toBeCloseTo(3.1, 9);
    expect(await storedTone(first)).toEqual(await storedTone(oneByOne));
    expect(await storedTone(second)).toEqual(await storedTone(oneByOne));
  });

  it('refuse only the check dated in the future or on a print that does not exist', async () => {
    const ctx = await conservator();
    const id = await newPrint('Checked with mistakes');
    const outcomes = await Promise.allSettled([
      createToneCheck(ctx, id, CHECKS[0]!),
      createToneCheck(ctx, id, { ...CHECKS[1]!, checkedOn: '2999-01-01' }),
      createToneCheck(ctx, 999_999, CHECKS[0]!),
      createToneCheck(ctx, id, CHECKS[1]!),
    ]);
    const statuses = outcomes.map((outcome) =>
      outcome.status === 'fulfilled' ? 201 : (outcome.reason as { status: number }).status,
    );
    expect(statuses).toEqual([201, 422, 404, 201]);
    const [{ n }] = (await t.ctx.sequelize.query(
      'SELECT COUNT(*) AS n FROM tone_checks WHERE print_id = ?',
      {
        replacements: [id],
        type: QueryTypes.SELECT,
      },
    )) as [{ n: number }];
    expect(Number(n)).toBe(2);
  });
});
