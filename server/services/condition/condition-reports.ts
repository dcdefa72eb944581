import type { Transaction } from 'sequelize';
import type {
  ConditionReportCreate,
  ConditionReportUpdate,
} from '../../../shared/schemas/condition';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import { checkDateProblem } from '../../../shared/domain/tone/check-date';
import { Print, type ConditionReport } from '../../models';
import {
  deleteConditionReportRow,
  findConditionReportById,
  findConditionReportWithReporter,
  findConditionReportsOfPrint,
  insertConditionReport,
  updateConditionReportRow,
} from '../../repositories/condition-repository';
import type { StoredReportImage } from '../../models/ConditionReport';
import { recordAudit } from '../audit';
import { assertPrintExists } from '../prints/assert-print-exists';
import type { PrintCommandContext } from '../prints/print-command';
import { assertImagesOfPrint, withLooseAssets } from './attached-images';

type Ctx = Pick<PrintCommandContext, 'sequelize' | 'user'>;

/** `images` with marked areas first, then any plain `assetIds` not already listed. */
function imagesOf(input: Pick<ConditionReportCreate, 'images' | 'assetIds'>): StoredReportImage[] {
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

/** 422 when the report's date is before the print was made (the schema refuses future dates). */
async function assertReportDate(
  printId: number,
  reportedOn: string,
  transaction: Transaction,
): Promise<void> {
  const print = await Print.findByPk(printId, { attributes: ['id', 'madeFrom'], transaction });
  const problem = checkDateProblem(reportedOn, print?.madeFrom ?? null, undefined, 'report');
  if (problem) throw problems.invalid([{ path: 'reportedOn', message: problem }]);
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
    await assertReportDate(printId, input.reportedOn, transaction);
    await assertImagesOfPrint(
      printId,
      images.map((image) => image.assetId),
      'assetIds',
      transaction,
    );
    const report = await insertConditionReport(
      {
        printId,
        reportedOn: input.reportedOn,
        reportedBy: ctx.user.id,
        grade: input.grade,
        observations: input.observations,
        notes: input.notes,
        recommendation: input.recommendation,
        temperatureC: input.environment?.temperatureC ?? null,
        relativeHumidity: input.environment?.rh ?? null,
        images,
      },
      transaction,
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
  return (await findConditionReportWithReporter(id))!;
}

/** A print's condition reports, newest examination first. */
export async function listConditionReports(printId: number): Promise<ConditionReport[]> {
  await assertPrintExists(printId);
  return findConditionReportsOfPrint(printId);
}

/** A report of a live print, or 404. */
async function findReport(id: number, transaction: Transaction): Promise<ConditionReport> {
  const report = await findConditionReportById(id, transaction);
  if (!report) throw problems.notFound('The condition report');
  await assertPrintExists(report.printId);
  return report;
}

/** What the audit trail keeps of a report, before and after a change. */
function auditState(report: ConditionReport) {
  return {
    printId: report.printId,
    reportedOn: report.reportedOn,
    grade: report.grade,
    observations: report.observations,
    notes: report.notes,
    recommendation: report.recommendation,
    environment: { temperatureC: report.temperatureC, rh: report.relativeHumidity },
    images: report.images,
  };
}

/** Corrects a report; the audit trail keeps it before and after. */
export async function updateConditionReport(
  ctx: Ctx,
  id: number,
  input: ConditionReportUpdate,
): Promise<ConditionReport> {
  await writeTransaction(ctx.sequelize, async (transaction) => {
    const report = await findReport(id, transaction);
    const before = auditState(report);
    const changes: Partial<ConditionReport> = {};
    if (input.reportedOn !== undefined) {
      await assertReportDate(report.printId, input.reportedOn, transaction);
      changes.reportedOn = input.reportedOn;
    }
    if (input.grade !== undefined) changes.grade = input.grade;
    if (input.observations !== undefined) changes.observations = input.observations;
    if (input.notes !== undefined) changes.notes = input.notes;
    if (input.recommendation !== undefined) changes.recommendation = input.recommendation;
    if (input.environment !== undefined) {
      changes.temperatureC = input.environment?.temperatureC ?? null;
      changes.relativeHumidity = input.environment?.rh ?? null;
    }
    if (input.images !== undefined || input.assetIds !== undefined) {
      changes.images = imagesOf(input);
      await assertImagesOfPrint(
        report.printId,
        changes.images.map((image) => image.assetId),
        'assetIds',
        transaction,
      );
    }
    await updateConditionReportRow(report, changes, transaction);
    await recordAudit(
      {
        user: ctx.user,
        action: 'update',
        entity: 'condition-report',
        entityId: id,
        before,
        after: auditState(report),
      },
      transaction,
    );
  });
  return (await findConditionReportWithReporter(id))!;
}

/** Removes a report (audited with what it said). */
export async function deleteConditionReport(ctx: Ctx, id: number): Promise<void> {
  await writeTransaction(ctx.sequelize, async (transaction) => {
    const report = await findReport(id, transaction);
    await recordAudit(
      {
        user: ctx.user,
        action: 'delete',
        entity: 'condition-report',
        entityId: id,
        before: auditState(report),
      },
      transaction,
    );
    await deleteConditionReportRow(report, transaction);
  });
}
