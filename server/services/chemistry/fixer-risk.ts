import { Op, type Transaction } from 'sequelize';
import { ProcessingStep } from '../../models';
import { rederiveProcessingRisk } from '../prints/processing-risk';

/**
 * Re-derives the processing-risk reasons of every print fixed in one of `batchIds` (or,
 * with 'all', in any batch), after the batch record, its use or the capacity changed.
 */
export async function refreshFixerRisk(
  batchIds: readonly number[] | 'all',
  transaction: Transaction,
): Promise<void> {
  if (batchIds !== 'all' && batchIds.length === 0) return;
  const touching = await ProcessingStep.findAll({
    where: {
      stage: 'fixing',
      solutionBatchId: batchIds === 'all' ? { [Op.ne]: null } : { [Op.in]: [...batchIds] },
    },
    attributes: ['printId'],
    transaction,
  });
  await rederiveProcessingRisk([...new Set(touching.map((step) => step.printId))], transaction);
}
