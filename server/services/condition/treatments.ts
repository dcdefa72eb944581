import type { TreatmentCreate } from '../../../shared/schemas/condition';
import { writeTransaction } from '../../db/write-transaction';
import type { Treatment } from '../../models';
import {
  findTreatmentWithTreater,
  findTreatmentsOfPrint,
  insertTreatment,
} from '../../repositories/condition-repository';
import type { StoredTreatmentImage } from '../../models/Treatment';
import { recordAudit } from '../audit';
import { assertPrintExists } from '../prints/assert-print-exists';
import type { PrintCommandContext } from '../prints/print-command';
import { assertImagesOfPrint, withLooseAssets } from './attached-images';

type Ctx = Pick<PrintCommandContext, 'sequelize' | 'user'>;

function imagesOf(input: TreatmentCreate): StoredTreatmentImage[] {
  const staged: StoredTreatmentImage[] = [
    ...(input.beforeAssetIds ?? []).map((assetId) => ({ assetId, stage: 'before' as const })),
    ...(input.afterAssetIds ?? []).map((assetId) => ({ assetId, stage: 'after' as const })),
  ];
  return withLooseAssets(staged, input.assetIds, (assetId) => ({ assetId, stage: null }));
}

/** Records a treatment with its before and after images and an audit event. */
export async function createTreatment(
  ctx: Ctx,
  printId: number,
  input: TreatmentCreate,
): Promise<Treatment> {
  await assertPrintExists(printId);
  const images = imagesOf(input);
  const id = await writeTransaction(ctx.sequelize, async (transaction) => {
    await assertImagesOfPrint(
      printId,
      images.map((image) => image.assetId),
      'assetIds',
      transaction,
    );
    const treatment = await insertTreatment(
      {
        printId,
        treatedOn: input.treatedOn,
        treatedBy: ctx.user.id,
        action: input.action,
        materials: input.materials,
        notes: input.notes,
        images,
      },
      transaction,
    );
    await recordAudit(
      {
        user: ctx.user,
        action: 'create',
        entity: 'treatment',
        entityId: treatment.id,
        after: { printId, ...input },
      },
      transaction,
    );
    return treatment.id;
  });
  return (await findTreatmentWithTreater(id))!;
}

/** A print's treatments, newest first. */
export async function listTreatments(printId: number): Promise<Treatment[]> {
  await assertPrintExists(printId);
  return findTreatmentsOfPrint(printId);
}
