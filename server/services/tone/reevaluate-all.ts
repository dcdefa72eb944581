import { QueryTypes, type Sequelize } from 'sequelize';
import { writeTransaction } from '../../db/write-transaction';
import { evaluatePrints, TONE_BATCH } from './evaluate-prints';
import { loadToneSettings } from './settings-store';

/** Progress moves in about this many steps however small the collection. */
const PROGRESS_STEPS = 20;

/**
 * How many prints one range takes. A collection smaller than one batch would jump from 0 to
 * all at once: it is cut in steps, so "done" always counts prints whose new state is
 * committed.
 */
export function rangeSize(total: number): number {
  return Math.min(TONE_BATCH, Math.max(1, Math.ceil(total / PROGRESS_STEPS)));
}

/**
 * Re-evaluates every live print's tone state after a settings change with the same
 * evaluation as one print after a check (`evaluatePrints`), a range of prints per write
 * transaction (reads and writes of a range in one transaction, so a check logged meanwhile
 * is never overwritten by a stale result). Only prints whose state moved are written and
 * noted as changed (the search index re-reads those after each commit).
 */
export async function reevaluateAllPrints(
  sequelize: Sequelize,
  onProgress: (done: number, total: number) => void = () => undefined,
  /** Asked between ranges: a shutdown stops the run there, every committed range kept. */
  shouldStop: () => boolean = () => false,
): Promise<number> {
  const settings = await loadToneSettings();
  const [{ total }] = (await sequelize.query<{ total: number }>(
    'SELECT COUNT(*) AS total FROM prints WHERE deleted_at IS NULL',
    { type: QueryTypes.SELECT },
  )) as [{ total: number }];
  let done = 0;
  let afterId = 0;
  const limit = rangeSize(total);
  onProgress(0, total);
  for (;;) {
    if (shouldStop()) break;
    const { printIds } = await writeTransaction(sequelize, (transaction) =>
      evaluatePrints(sequelize, settings, { afterId, limit }, transaction),
    );
    if (printIds.length === 0) break;
    done += printIds.length;
    afterId = printIds[printIds.length - 1]!;
    onProgress(Math.min(done, total), total);
  }
  return done;
}
