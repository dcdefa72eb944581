import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { derivePrintFields } from '../../../../shared/domain/print-derived';
import { evaluatePrintChecks } from '../../../../shared/domain/tone/evaluate';
import { storedToneOf } from '../../../../shared/domain/tone/stored-state';
import { writeTransaction } from '../../../../server/db/write-transaction';
import { Print, ToneCheck } from '../../../../server/models';
import { evaluatePrints } from '../../../../server/services/tone/evaluate-prints';
import { loadToneSettings } from '../../../../server/services/tone/settings-store';
import { startTestApp, type TestApp } from '../../../support/test-app';
import { storedToneColumns } from '../../../support/tone-stored';

/*
 * A range's checks are read a part at a time (250 prints), the next part while the current
 * one is decided. A range over several parts, with deleted prints and prints without checks
 * among them, must evaluate every live print in it once, in id order, and store what the pure
 * domain evaluation gives for each.
 */
const PRINTS = 640;

let t: TestApp;
let ids: number[] = [];
beforeAll(async () => {
  t = await startTestApp();
  const prints = await Print.bulkCreate(
    Array.from({ length: PRINTS }, (_, i) => ({
      accessionNumber: `RP.${String(i).padStart(4, '0')}`,
      title: `Range part ${i}`,
      madeOn: '2011',
      process: 'salt print' as const,
      status: 'in storage' as const,
      tags: [],
      ...derivePrintFields({ madeOn: '2011', process: 'salt print', processing: [] }),
    })),
  );
  ids = prints.map((print) => print.id);
  // Every seventh print has no checks; the others drift at their own rate.
  await ToneCheck.bulkCreate(
    ids.flatMap((printId, i) =>
      i % 7 === 0
        ? []
        : [0, 1, 2, 3].map((year) => ({
            printId,
            checkedOn: `${2015 + year}-03-01`,
            method: 'spectrophotometer' as const,
            illuminant: 'D50' as const,
            observer: '2' as const,
            baseline: year === 0,
            readings: [
              { patch: 'dmax', L: 28 + (i % 5) * 0.4 * year, a: 7, b: 11 },
              { patch: 'dmin', L: 93, a: 0.5, b: 4.2 + (i % 3) * 0.9 * year },
            ],
          })),
    ),
  );
  // Deleted prints are skipped by a range, wherever they fall in a part.
  await Print.destroy({ where: { id: [ids[3]!, ids[249]!, ids[250]!, ids[251]!, ids[600]!] } });
});
afterAll(() => t.close());

describe('a range read in parts', () => {
  it('evaluates every live print of the range once, in id order, as the domain does', async () => {
    const settings = await loadToneSettings();
    const deleted = new Set([ids[3], ids[249], ids[250], ids[251], ids[600]]);
    const live = ids.filter((id) => !deleted.has(id));
    const { printIds, changedIds } = await writeTransaction(t.ctx.sequelize, (transaction) =>
      evaluatePrints(t.ctx.sequelize, settings, { afterId: 0, limit: 2000 }, transaction),
    );
    expect(printIds).toEqual(live);
    expect(changedIds.length).toBeGreaterThan(500);

    const rows = await t.ctx.sequelize.query<Record<string, unknown>>(
      `SELECT id, tone_status, tone_flags, tone_urgency, next_check_due, tone_baseline_on,
              tone_rate_per_year, tone_sparkline FROM prints WHERE deleted_at IS NULL ORDER BY id`,
      { type: QueryTypes.SELECT },
    );
    const checks = await ToneCheck.findAll();
    for (const row of rows) {
      const own = checks
        .filter((check) => check.printId === row.id)
        .map((check) => check.get({ plain: true }));
      const expected = storedToneOf(evaluatePrintChecks(own, settings, 'unchecked'));
      expect(storedToneColumns(row)).toEqual(expected);
    }
  });
});
