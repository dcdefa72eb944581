import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluatePrintChecks } from '../../../../shared/domain/tone/evaluate';
import { storedToneOf } from '../../../../shared/domain/tone/stored-state';
import { TONE_STATUSES, type ToneStatus } from '../../../../shared/domain/vocabulary';
import { writeTransaction } from '../../../../server/db/write-transaction';
import { ToneCheck } from '../../../../server/models';
import { evaluateStoredPrint } from '../../../../server/services/tone/evaluate-print';
import { loadToneSettings } from '../../../../server/services/tone/settings-store';
import { buildPrint } from '../../../support/factories';
import { startTestApp, type TestApp } from '../../../support/test-app';
import { storedToneColumns } from '../../../support/tone-stored';

/*
 * The tone state a print stores must not depend on the path that computed it: one print
 * after a check (`evaluateStoredPrint`) and every print after a settings change
 * (the `tone-reevaluation` job) must store the same columns, re-derive the same processing-risk
 * reasons and open the same alerts, and both must store what the pure domain evaluation
 * (`evaluatePrintChecks`) gives. Varied prints: no checks, one, many; several baselines;
 * patches missing from some checks; drifts from none to strong; every stored status before.
 */
const PRINTS = 24;
const PATCHES = ['dmax', 'mid', 'highlight', 'dmin'] as const;
const BASE: Record<(typeof PATCHES)[number], { L: number; a: number; b: number }> = {
  dmax: { L: 28, a: 7, b: 11 },
  mid: { L: 54, a: 5, b: 14 },
  highlight: { L: 87, a: 1.5, b: 7 },
  dmin: { L: 93, a: 0.5, b: 4.2 },
};

const checkArb = fc.record({
  day: fc.integer({ min: 0, max: 4000 }),
  baseline: fc.boolean(),
  patches: fc.subarray([...PATCHES], { minLength: 1 }),
  noise: fc.double({ min: -0.4, max: 0.4, noNaN: true }),
});
const printArb = fc.record({
  before: fc.constantFrom<ToneStatus>(...TONE_STATUSES),
  drift: fc.constantFrom(0, 0.05, 0.3, 1, 2.5),
  checks: fc.array(checkArb, { maxLength: 7 }),
});

type PrintCase = typeof printArb extends fc.Arbitrary<infer T> ? T : never;

let t: TestApp;
const ids: number[] = [];
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  for (let i = 0; i < PRINTS; i += 1) {
    const made = i % 3 === 0 ? '2012-01-01' : '2011-06-15';
    const response = await archivist
      .post('/api/prints')
      .send(buildPrint({ title: `Agreement ${i}`, madeOn: made }))
      .expect(201);
    ids.push((response.body as { id: number }).id);
  }
});
afterAll(() => t.close());

const isoDay = (day: number) =>
  new Date(Date.UTC(2012, 0, 1) + day * 86_400_000).toISOString().slice(0, 10);

/** Puts the generated checks in place and every print back to its generated stored state. */
async function arrange(cases: ReadonlyArray<PrintCase>): Promise<void> {
  const sequelize = t.ctx.sequelize;
  await sequelize.query('DELETE FROM tone_checks');
  await sequelize.query('DELETE FROM alerts');
  await sequelize.query(
    `UPDATE prints SET tone_status = 'unchecked', tone_flags = '[]', tone_urgency = 0,
       next_check_due = NULL, tone_baseline_on = NULL, tone_rate_per_year = NULL,
       tone_sparkline = NULL`,
  );
  const rows = cases.flatMap((print, index) =>
    [...print.checks]
      .sort((x, y) => x.day - y.day)
      .map((check, k) => ({
        printId: ids[index]!,
        checkedOn: isoDay(check.day),
        checkedBy: null,
        method: 'spectrophotometer',
        illuminant: 'D50',
        observer: '2',
        baseline: check.baseline,
        readings: check.patches.map((patch) => ({
          patch,
          L: BASE[patch].L - print.drift * k * 0.7 + check.noise,
          a: BASE[patch].a + check.noise / 2,
          b: BASE[patch].b + print.drift * k - check.noise,
        })),
      })),
  );
  await ToneCheck.bulkCreate(rows);
  for (const [index, print] of cases.entries()) {
    await sequelize.query('UPDATE prints SET tone_status = ? WHERE id = ?', {
      replacements: [print.before, ids[index]],
    });
  }
}

/** What each print stores about its tone and its risk, and the alerts open, in id order. */
async function stored() {
  const sequelize = t.ctx.sequelize;
  const prints = await sequelize.query(
    `SELECT id, tone_status, tone_flags, tone_urgency, next_check_due, tone_baseline_on,
            tone_rate_per_year, tone_sparkline, has_processing_risk, risk_reasons
       FROM prints ORDER BY id`,
    { type: QueryTypes.SELECT },
  );
  const alerts = await sequelize.query(
    'SELECT print_id, kind, reason FROM alerts ORDER BY print_id, kind, reason',
    { type: QueryTypes.SELECT },
  );
  return { prints, alerts };
}

describe('tone state: one print and all prints agree', () => {
  it('stores the same state, risk reasons and alerts by either path, and what the domain gives', async () => {
    const settings = await loadToneSettings();
    await fc.assert(
      fc.asyncProperty(
        fc.array(printArb, { minLength: PRINTS, maxLength: PRINTS }),
        async (cases) => {
          await arrange(cases);
          for (const id of ids) {
            await writeTransaction(t.ctx.sequelize, (transaction) =>
              evaluateStoredPrint(id, settings, transaction),
            );
          }
          const onePrint = await stored();

          await arrange(cases);
          // As a settings change runs it: the job, its ranges and its progress row.
          await t.ctx.toneReevaluation.request();
          await t.ctx.toneReevaluation.idle();
          const allPrints = await stored();
          expect(allPrints).toEqual(onePrint);

          // Both equal the pure evaluation of each print's checks from its stored status.
          for (const [index, print] of cases.entries()) {
            const checks = (await ToneCheck.findAll({ where: { printId: ids[index]! } })).map(
              (check) => check.get({ plain: true }),
            );
            const expected = storedToneOf(evaluatePrintChecks(checks, settings, print.before));
            const row = onePrint.prints[index] as Record<string, unknown>;
            expect(storedToneColumns(row)).toEqual(expected);
          }
        },
      ),
      { numRuns: 12 },
    );
  }, 120_000);
});
