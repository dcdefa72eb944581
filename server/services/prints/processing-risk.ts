import { Op, type Transaction } from 'sequelize';
import {
  hasProcessingRisk,
  processingRiskReasons,
  type RiskContext,
} from '../../../shared/domain/processing';
import type { StoredRiskReason } from '../../../shared/domain/print-derived';
import { toneBaselineRiskReasons } from '../../../shared/domain/tone-processing-risk';
import { notePrintsChanged } from '../../db/prints-changed';
import { Print, ProcessingStep } from '../../models';
import { fixerBatchUses } from '../chemistry/fixer-use';

/**
 * The facts beyond the steps that the risk rules need, per print. A rule that needs a new
 * fact adds its field here, so every caller of `rederiveProcessingRisk` stores all reasons.
 */
async function riskContexts(
  prints: Print[],
  transaction: Transaction,
): Promise<Map<number, RiskContext>> {
  const fixers = await fixerBatchUses(prints, transaction);
  return new Map(
    prints.map((print) => [
      print.id,
      {
        madeFrom: print.madeFrom,
        madeTo: print.madeTo,
        fixerBatches: fixers.get(print.id) ?? [],
      },
    ]),
  );
}

/**
 * Re-derives and stores the processing-risk reasons of the given prints with every rule,
 * including those that need more than the steps (batch records, other prints, dates).
 */
export async function rederiveProcessingRisk(
  printIds: readonly number[],
  transaction: Transaction,
): Promise<void> {
  if (printIds.length === 0) return;
  const prints = await Print.findAll({
    where: { id: { [Op.in]: [...printIds] } },
    include: [{ model: ProcessingStep, as: 'processing' }],
    order: [[{ model: ProcessingStep, as: 'processing' }, 'position', 'ASC']],
    transaction,
  });
  const contexts = await riskContexts(prints, transaction);
  for (const print of prints) {
    const stepReasons = processingRiskReasons(
      print.processing ?? [],
      print.process,
      contexts.get(print.id),
    );
    // The tone record's rule (a baseline measured before the print dried down) is kept too.
    const toneReasons = toneBaselineRiskReasons(print.madeFrom, print.madeTo, print.toneBaselineOn);
    const reasons: StoredRiskReason[] = [...stepReasons, ...toneReasons];
    if (JSON.stringify(reasons) === JSON.stringify(print.riskReasons)) continue;
    // Only prints whose reasons moved are re-indexed (after the commit, before the answer).
    notePrintsChanged(transaction, [print.id], 'derived');
    // Derived fields: no hooks and no new updatedAt, as for the columns derived on write.
    await print.update(
      {
        riskReasons: reasons,
        hasProcessingRisk: hasProcessingRisk(stepReasons) || toneReasons.length > 0,
      },
      { transaction, hooks: false, silent: true },
    );
  }
}
