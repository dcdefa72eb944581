import { Op, type Transaction } from 'sequelize';
import {
  bathCapacity,
  sheetsThroughBath,
  type BathSheet,
} from '../../../shared/domain/chemistry/fixer-usage';
import {
  hasProcessingRisk,
  processingRiskReasons,
  type FixerBatchUse,
} from '../../../shared/domain/processing';
import { Print, ProcessingStep, SolutionBatch } from '../../models';
import { readChemistrySettings } from './settings';

/** Batch ids named by the fixing steps among `steps`. */
export function fixingBatchIds(
  steps: ReadonlyArray<{ stage: string; solutionBatchId?: number | null }>,
): number[] {
  const ids = steps
    .filter((step) => step.stage === 'fixing' && step.solutionBatchId != null)
    .map((step) => step.solutionBatchId!);
  return [...new Set(ids)];
}

/** Every print (not deleted) fixed in each batch, as sheets through the bath. */
export async function bathSheets(
  batchIds: readonly number[],
  transaction?: Transaction,
): Promise<Map<number, BathSheet[]>> {
  const steps = await ProcessingStep.findAll({
    where: { stage: 'fixing', solutionBatchId: { [Op.in]: [...batchIds] } },
    attributes: ['printId', 'solutionBatchId'],
    transaction,
  });
  const prints = await Print.findAll({
    where: { id: { [Op.in]: [...new Set(steps.map((step) => step.printId))] } },
    attributes: ['id', 'madeFrom', 'sheetWidthMm', 'sheetHeightMm'],
    transaction,
  });
  const byId = new Map(prints.map((print) => [print.id, print]));
  const sheets = new Map<number, BathSheet[]>(batchIds.map((id) => [id, []]));
  for (const step of steps) {
    const print = byId.get(step.printId);
    if (!print) continue; // soft-deleted
    sheets.get(step.solutionBatchId!)!.push({
      printId: print.id,
      madeFrom: print.madeFrom,
      sheetWidthMm: print.sheetWidthMm,
      sheetHeightMm: print.sheetHeightMm,
    });
  }
  return sheets;
}

/**
 * Re-derives the processing-risk reasons of every print fixed in one of `batchIds` (or,
 * with 'all', in any batch), now that the batch record, its use or the capacity changed.
 * The step rules are re-derived too, so the stored reasons are always the whole set.
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
  const printIds = [...new Set(touching.map((step) => step.printId))];
  if (printIds.length === 0) return;
  const prints = await Print.findAll({
    where: { id: { [Op.in]: printIds } },
    include: [{ model: ProcessingStep, as: 'processing' }],
    order: [[{ model: ProcessingStep, as: 'processing' }, 'position', 'ASC']],
    transaction,
  });
  const usedIds = [...new Set(prints.flatMap((print) => fixingBatchIds(print.processing ?? [])))];
  const uses = await fixerUses(usedIds, transaction);
  for (const print of prints) {
    const steps = print.processing ?? [];
    const fixerBatches = fixingBatchIds(steps).map((id) => uses(id, print.id));
    const reasons = processingRiskReasons(steps, print.process, {
      madeFrom: print.madeFrom,
      fixerBatches: fixerBatches.filter((use): use is FixerBatchUse => use !== null),
    });
    if (JSON.stringify(reasons) === JSON.stringify(print.riskReasons)) continue;
    await print.update(
      { riskReasons: reasons, hasProcessingRisk: hasProcessingRisk(reasons) },
      { transaction, hooks: false, silent: true },
    );
  }
}

/** A lookup of each batch's facts as used for a given print. */
async function fixerUses(batchIds: number[], transaction: Transaction) {
  // One after another: a transaction holds one SQLite connection.
  const batches = await SolutionBatch.findAll({
    where: { id: { [Op.in]: batchIds } },
    transaction,
  });
  const sheets = await bathSheets(batchIds, transaction);
  const settings = await readChemistrySettings(transaction);
  const through = new Map(
    [...sheets].map(([batchId, list]) => [batchId, sheetsThroughBath(list)] as const),
  );
  const byId = new Map(batches.map((batch) => [batch.id, batch]));
  return (batchId: number, printId: number): FixerBatchUse | null => {
    const batch = byId.get(batchId);
    if (!batch) return null;
    return {
      id: batch.id,
      code: batch.code,
      exhaustedOn: batch.exhaustedOn,
      sheetsThrough: through.get(batchId)?.get(printId) ?? null,
      capacitySheets: bathCapacity(batch.volumeMl, settings.fixerCapacitySheetsPerLitre),
    };
  };
}
