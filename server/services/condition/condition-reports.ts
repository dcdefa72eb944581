import type { ConditionReportCreate } from '../../../shared/schemas/condition';
import { writeTransaction } from '../../db/write-transaction';
import { ConditionReport, User } from '../../models';
import type { StoredReportImage } from '../../models/ConditionReport';
import { recordAudit } from '../audit';
import { assertPrintExists } from '../prints/assert-print-exists';
import type { PrintCommandContext } from '../prints/print-command';
import { assertImagesOfPrint, withLooseAssets } from './attached-images';

type Ctx = Pick<PrintCommandContext, 'sequelize' | 'user'>;

/** `images` with marked areas first, then any plain `assetIds` not already listed. */
function imagesOf(input: ConditionReportCreate): StoredReportImage[] {
  const marked = (input.images ?? []).map((image) => ({
    assetId: image.assetId,
    area: image.area ?? null,
    caption: image.caption ?? null,
  }));
  return withLooseAssets(marked, input.assetIds, (assetId) => ({
    assetId,
    area: null,
    caption: null,
  }));
}

/** Records a condition report, its attached images checked against the print, with an audit event. */
export async function createConditionReport(
  ctx: Ctx,
  printId: number,
  input: ConditionReportCreate,
): Promise<ConditionReport> {
  await assertPrintExists(printId);
  const images = imagesOf(input);
  const id = await writeTransaction(ctx.sequelize, async (transaction) => {
    await assertImagesOfPrint(
      printId,
      images.map((image) => image.assetId),
      'assetIds',
      transaction,
    );
    const report = await ConditionReport.create(
      {
        printId,
        reportedOn: input.reportedOn,
        reportedBy: ctx.user.id,
        grade: input.grade ?? null,
        observations: input.observations,
        notes: input.notes,
        recommendation: input.recommendation,
        temperatureC: input.environment?.temperatureC ?? null,
        relativeHumidity: input.environment?.rh ?? null,
        images,
      },
      { transaction },
    );
    await recordAudit(
      {
        user: ctx.user,
        action: 'create',
        entity: 'condition-report',
        entityId: report.id,
        after: { printId, ...input, images },
      },
      transaction,
    );
    return report.id;
  });
  return (await ConditionReport.findByPk(id, { include: [{ model: User, as: 'reporter' }] }))!;
}

/** A print's condition reports, newest examination first. */
export async function listConditionReports(printId: number): Promise<ConditionReport[]> {
  await assertPrintExists(printId);
  return ConditionReport.findAll({
    where: { printId },
    include: [{ model: User, as: 'reporter' }],
    order: [
      ['reportedOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
}
