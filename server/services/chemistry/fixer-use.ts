import { Op, type Transaction } from 'sequelize';
import {
  bathCapacity,
  sheetsThroughBath,
  type BathSheet,
} from '../../../shared/domain/chemistry/fixer-usage';
import type { FixerBatchUse } from '../../../shared/domain/processing';
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
 * The fixer batches each print was fixed in, with the batch record's facts and the sheets
 * through the bath up to that print (the `fixerBatches` of its risk context).
 */
export async function fixerBatchUses(
  prints: ReadonlyArray<Pick<Print, 'id' | 'processing'>>,
  transaction?: Transaction,
): Promise<Map<number, FixerBatchUse[]>> {
  const batchIds = [...new Set(prints.flatMap((print) => fixingBatchIds(print.processing ?? [])))];
  const uses = new Map<number, FixerBatchUse[]>();
  if (batchIds.length === 0) return uses;
  // One after another: a transaction holds one SQLite connection.
  const batches = await SolutionBatch.findAll({
    where: { id: { [Op.in]: batchIds } },
    transaction,
  });
  const sheets = await bathSheets(batchIds, transaction);
  const { fixerCapacitySheetsPerLitre } = await readChemistrySettings(transaction);
  const through = new Map([...sheets].map(([id, list]) => [id, sheetsThroughBath(list)] as const));
  const byId = new Map(batches.map((batch) => [batch.id, batch]));
  for (const print of prints) {
    const list = fixingBatchIds(print.processing ?? []).flatMap((batchId) => {
      const batch = byId.get(batchId);
      if (!batch) return [];
      return [
        {
          id: batch.id,
          code: batch.code,
          madeOn: batch.madeOn,
          exhaustedOn: batch.exhaustedOn,
          sheetsThrough: through.get(batchId)?.get(print.id) ?? null,
          capacitySheets: bathCapacity(batch.volumeMl, fixerCapacitySheetsPerLitre),
        },
      ];
    });
    uses.set(print.id, list);
  }
  return uses;
}
