import type { CreationAttributes, Transaction } from 'sequelize';
import { ConditionReport, Treatment, User } from '../models';

type ReportRow = CreationAttributes<ConditionReport>;
type TreatmentRow = CreationAttributes<Treatment>;

/** Condition reports and treatments; their attached images are a JSON column of the row. */
export function insertConditionReport(row: ReportRow, transaction: Transaction) {
  return ConditionReport.create(row, { transaction });
}

export function findConditionReportById(id: number, transaction?: Transaction) {
  return ConditionReport.findByPk(id, { transaction });
}

/** One report with the person who examined the print. */
export async function findConditionReportWithReporter(id: number) {
  return ConditionReport.findByPk(id, { include: [{ model: User, as: 'reporter' }] });
}

/** A print's reports, newest examination first. */
export function findConditionReportsOfPrint(printId: number) {
  return ConditionReport.findAll({
    where: { printId },
    include: [{ model: User, as: 'reporter' }],
    order: [
      ['reportedOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
}

export async function updateConditionReportRow(
  report: ConditionReport,
  changes: Partial<ConditionReport>,
  transaction: Transaction,
): Promise<void> {
  await report.update(changes, { transaction });
}

export async function deleteConditionReportRow(
  report: ConditionReport,
  transaction: Transaction,
): Promise<void> {
  await report.destroy({ transaction });
}

export function insertTreatment(row: TreatmentRow, transaction: Transaction) {
  return Treatment.create(row, { transaction });
}

/** One treatment with the person who did it. */
export function findTreatmentWithTreater(id: number) {
  return Treatment.findByPk(id, { include: [{ model: User, as: 'treater' }] });
}

/** A print's treatments, newest first. */
export function findTreatmentsOfPrint(printId: number) {
  return Treatment.findAll({
    where: { printId },
    include: [{ model: User, as: 'treater' }],
    order: [
      ['treatedOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
}
