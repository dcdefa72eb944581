import type { Transaction } from 'sequelize';
import { derivePrintFields } from '../../../shared/domain/print-derived';
import type { ProcessingStep as StepInput } from '../../../shared/schemas/processing-step';
import type { FieldError } from '../../middleware/problem';
import { problems } from '../../middleware/problem';
import { Location, Negative, Paper, ProcessingStep, SolutionBatch } from '../../models';
import type { Print } from '../../models';
import { assertRegistrarLinks, type RegistrarInput } from './registrar-write';

interface Links extends RegistrarInput {
  paperId?: number | null;
  negativeId?: number | null;
  locationId?: number | null;
  processing?: readonly StepInput[];
}

/**
 * 422 naming each linked id (paper, negative, location, batch, source, a mark's image) that
 * does not exist; `printId` is the print being changed (null for a new one).
 */
export async function assertLinksExist(
  input: Links,
  transaction: Transaction,
  printId: number | null = null,
): Promise<void> {
  const errors: FieldError[] = [];
  const check = async (
    model: typeof Paper | typeof Negative | typeof Location | typeof SolutionBatch,
    id: number | null | undefined,
    path: string,
  ) => {
    if (id == null) return;
    const count = await (model as typeof Paper).count({ where: { id }, transaction });
    if (count === 0) errors.push({ path, message: `No record with id ${id}` });
  };
  await check(Paper, input.paperId, 'paperId');
  await check(Negative, input.negativeId, 'negativeId');
  await check(Location, input.locationId, 'locationId');
  for (const [index, step] of (input.processing ?? []).entries()) {
    await check(SolutionBatch, step.solutionBatchId, `processing.${index}.solutionBatchId`);
  }
  if (errors.length) throw problems.invalid(errors);
  await assertRegistrarLinks(input, printId, transaction);
}

/** Replaces the print's processing history with `steps`, positions 1…n in the given order. */
export async function replaceSteps(
  printId: number,
  steps: readonly StepInput[],
  transaction: Transaction,
): Promise<void> {
  await ProcessingStep.destroy({ where: { printId }, transaction });
  await insertSteps(printId, steps, transaction);
}

/** A step as typed, with every field it leaves out stored as null. */
export function stepValues(step: StepInput) {
  return {
    stage: step.stage,
    chemical: step.chemical ?? null,
    concentrationPercent: step.concentrationPercent ?? null,
    solutionBatchId: step.solutionBatchId ?? null,
    method: step.method ?? null,
    coats: step.coats ?? null,
    minutes: step.minutes ?? null,
    temperatureC: step.temperatureC ?? null,
    lightSource: step.lightSource ?? null,
    notes: step.notes ?? null,
  };
}

/** Writes the steps of a print that has none yet. */
export async function insertSteps(
  printId: number,
  steps: readonly StepInput[],
  transaction: Transaction,
): Promise<void> {
  await ProcessingStep.bulkCreate(
    steps.map((step, index) => ({ printId, position: index + 1, ...stepValues(step) })),
    { transaction },
  );
}

/** Derived columns from the print as it will be after the write. */
export function derivedColumns(
  print: Pick<Print, 'madeOn' | 'process'> & { toneBaselineOn?: string | null },
  processing: readonly StepInput[] | readonly ProcessingStep[],
) {
  const { madeOn, process, toneBaselineOn } = print;
  return derivePrintFields({ madeOn, process, processing, toneBaselineOn });
}
