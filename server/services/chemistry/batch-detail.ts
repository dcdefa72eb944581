import { Op } from 'sequelize';
import { bathCapacity } from '../../../shared/domain/chemistry/fixer-usage';
import { eightByTenEquivalents } from '../../../shared/domain/chemistry/sheets';
import type { Stage } from '../../../shared/domain/vocabulary';
import type { SolutionBatchView } from '../../../shared/types/catalogue';
import type { SolutionBatchDetail } from '../../../shared/types/chemistry';
import { problems } from '../../middleware/problem';
import { Print, ProcessingStep, SolutionBatch } from '../../models';
import { bathSheets } from './fixer-use';
import { readChemistrySettings } from './settings';

/** What a batch's page shows beyond the batch itself (which its route presents). */
export type BatchDetailParts = Omit<SolutionBatchDetail, keyof SolutionBatchView> & {
  batch: SolutionBatch;
};

/** A batch with the prints made with it (newest first) and, for a fixer bath, its use. */
export async function loadBatchDetail(id: number): Promise<BatchDetailParts> {
  const batch = await SolutionBatch.findByPk(id);
  if (!batch) throw problems.notFound('The solution batch');
  const steps = await ProcessingStep.findAll({
    where: { solutionBatchId: id },
    attributes: ['printId', 'stage'],
  });
  const stagesOf = new Map<number, Stage[]>();
  for (const step of steps) {
    const stages = stagesOf.get(step.printId) ?? [];
    if (!stages.includes(step.stage)) stages.push(step.stage);
    stagesOf.set(step.printId, stages);
  }
  const prints = await Print.findAll({
    where: { id: { [Op.in]: [...stagesOf.keys()] } },
    attributes: ['id', 'accessionNumber', 'title', 'madeOn', 'toneStatus', 'hasProcessingRisk'],
    order: [
      ['madeFrom', 'DESC NULLS LAST'],
      ['accessionNumber', 'DESC'],
    ],
  });
  const fixing = steps.some((step) => step.stage === 'fixing');
  return {
    batch,
    prints: prints.map((print) => ({
      id: print.id,
      accessionNumber: print.accessionNumber,
      title: print.title,
      madeOn: print.madeOn,
      stages: stagesOf.get(print.id) ?? [],
      toneStatus: print.toneStatus,
      processingRisk: print.hasProcessingRisk,
    })),
    fixerUse: fixing || batch.kind === 'fixer' ? await fixerUse(batch) : null,
  };
}

async function fixerUse(batch: SolutionBatch): Promise<SolutionBatchDetail['fixerUse']> {
  const { fixerCapacitySheetsPerLitre } = await readChemistrySettings();
  const sheets = (await bathSheets([batch.id])).get(batch.id) ?? [];
  return {
    sheets: sheets.reduce(
      (sum, sheet) => sum + eightByTenEquivalents(sheet.sheetWidthMm, sheet.sheetHeightMm),
      0,
    ),
    capacitySheets: bathCapacity(batch.volumeMl, fixerCapacitySheetsPerLitre),
    sheetsPerLitre: fixerCapacitySheetsPerLitre,
  };
}
