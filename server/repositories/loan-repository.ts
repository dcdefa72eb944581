import type { Sequelize, Transaction } from 'sequelize';
import { DOSE_STAGES, type LoanKind, type LoanStage } from '../../shared/domain/loans';
import type { Process } from '../../shared/domain/vocabulary';
import { dialectOf } from '../db/dialect';
import { insertMany, runBound } from '../db/insert-many';
import { selectRows } from '../db/select-rows';

/** A loan as stored, its signer's name beside it. */
export interface LoanRow {
  id: number;
  title: string;
  kind: LoanKind;
  venue: string;
  contact: string | null;
  starts_on: string;
  ends_on: string;
  hours_per_day: number;
  max_lux: number;
  max_uv: number | null;
  temperature_min: number | null;
  temperature_max: number | null;
  humidity_min: number | null;
  humidity_max: number | null;
  stage: LoanStage;
  conditions_signed_by: number | null;
  conditions_signed_on: string | null;
  signer_name: string | null;
  away_location_id: number | null;
  away_code: string | null;
}

/** Column values of a loan to write (snake_case). */
export type LoanColumns = Partial<Omit<LoanRow, 'id' | 'signer_name' | 'away_code'>>;

const LOAN_SELECT = `SELECT l.*, u.name AS signer_name, a.code AS away_code
  FROM loans l LEFT JOIN users u ON u.id = l.conditions_signed_by
  LEFT JOIN locations a ON a.id = l.away_location_id`;

const day = (value: string | null) => (value === null ? null : String(value).slice(0, 10));
const decode = (row: LoanRow): LoanRow => ({
  ...row,
  starts_on: day(row.starts_on)!,
  ends_on: day(row.ends_on)!,
  conditions_signed_on: day(row.conditions_signed_on),
});

/** Writes a new loan; returns its id. */
export async function insertLoan(
  sequelize: Sequelize,
  values: LoanColumns & { created_by: number },
  transaction: Transaction,
): Promise<number> {
  const now = dialectOf(sequelize).dateValue(new Date());
  const row = { ...values, created_at: now, updated_at: now };
  await insertMany(sequelize, 'loans', Object.keys(row), [Object.values(row)], transaction);
  // Writers are one at a time (writeTransaction): the highest id is this one.
  const [found] = await selectRows<{ id: number }>(
    sequelize,
    'SELECT MAX(id) AS id FROM loans',
    [],
    transaction,
  );
  return found!.id;
}

/** Changes some columns of a loan. */
export async function updateLoanRow(
  sequelize: Sequelize,
  id: number,
  values: LoanColumns,
  transaction: Transaction,
): Promise<void> {
  const entries = Object.entries({
    ...values,
    updated_at: dialectOf(sequelize).dateValue(new Date()),
  });
  await runBound(
    sequelize,
    `UPDATE loans SET ${entries.map(([column]) => `${column} = ?`).join(', ')} WHERE id = ?`,
    [...entries.map(([, value]) => value), id],
    transaction,
  );
}

export async function findLoanRow(
  sequelize: Sequelize,
  id: number,
  transaction?: Transaction,
): Promise<LoanRow | null> {
  const rows = await selectRows<LoanRow>(
    sequelize,
    `${LOAN_SELECT} WHERE l.id = ?`,
    [id],
    transaction,
  );
  return rows[0] ? decode(rows[0]) : null;
}

/** Every loan, the latest start first, with its count of prints. */
export async function findLoanRows(
  sequelize: Sequelize,
): Promise<Array<LoanRow & { print_count: number }>> {
  const rows = await selectRows<LoanRow & { print_count: number }>(
    sequelize,
    `SELECT l.*, NULL AS signer_name, NULL AS away_code,
       (SELECT COUNT(*) FROM loan_prints lp WHERE lp.loan_id = l.id) AS print_count
     FROM loans l ORDER BY l.starts_on DESC, l.id DESC`,
    [],
  );
  return rows.map((row) => ({ ...decode(row), print_count: Number(row.print_count) }));
}

/** A print on a loan as stored, with what the loan's sheet and planning need of the print. */
export interface LoanPrintRow {
  print_id: number;
  position: number;
  departure_report_id: number | null;
  return_report_id: number | null;
  left_from_location_id: number | null;
  accession_number: string;
  title: string;
  process: Process;
  sheet_width_mm: number | null;
  sheet_height_mm: number | null;
  location_id: number | null;
}

export function findLoanPrints(
  sequelize: Sequelize,
  loanId: number,
  transaction?: Transaction,
): Promise<LoanPrintRow[]> {
  return selectRows<LoanPrintRow>(
    sequelize,
    `SELECT lp.print_id, lp.position, lp.departure_report_id, lp.return_report_id,
            lp.left_from_location_id, p.accession_number, p.title, p.process,
            p.sheet_width_mm, p.sheet_height_mm, p.location_id
     FROM loan_prints lp JOIN prints p ON p.id = lp.print_id
     WHERE lp.loan_id = ? ORDER BY lp.position`,
    [loanId],
    transaction,
  );
}

/** Sets a loan's prints in order, keeping the reports and origins of those that stay. */
export async function replaceLoanPrints(
  sequelize: Sequelize,
  loanId: number,
  printIds: readonly number[],
  transaction: Transaction,
): Promise<void> {
  const kept = new Map(
    (await findLoanPrints(sequelize, loanId, transaction)).map((row) => [row.print_id, row]),
  );
  await runBound(sequelize, 'DELETE FROM loan_prints WHERE loan_id = ?', [loanId], transaction);
  const ids = [...new Set(printIds)];
  if (ids.length === 0) return;
  await insertMany(
    sequelize,
    'loan_prints',
    [
      'loan_id',
      'print_id',
      'position',
      'departure_report_id',
      'return_report_id',
      'left_from_location_id',
    ],
    ids.map((printId, index) => {
      const before = kept.get(printId);
      return [
        loanId,
        printId,
        index + 1,
        before?.departure_report_id ?? null,
        before?.return_report_id ?? null,
        before?.left_from_location_id ?? null,
      ];
    }),
    transaction,
  );
}

/** Links a print's condition reports at departure and return (undefined: unchanged). */
export async function setLoanPrintReports(
  sequelize: Sequelize,
  loanId: number,
  link: { printId: number; departureReportId?: number | null; returnReportId?: number | null },
  transaction: Transaction,
): Promise<void> {
  const sets: string[] = [];
  const values: unknown[] = [];
  if (link.departureReportId !== undefined) {
    sets.push('departure_report_id = ?');
    values.push(link.departureReportId);
  }
  if (link.returnReportId !== undefined) {
    sets.push('return_report_id = ?');
    values.push(link.returnReportId);
  }
  if (!sets.length) return;
  await runBound(
    sequelize,
    `UPDATE loan_prints SET ${sets.join(', ')} WHERE loan_id = ? AND print_id = ?`,
    [...values, loanId, link.printId],
    transaction,
  );
}

/** Remembers where each print left from, for the way back. */
export async function setLeftFrom(
  sequelize: Sequelize,
  loanId: number,
  origins: ReadonlyArray<{ printId: number; locationId: number | null }>,
  transaction: Transaction,
): Promise<void> {
  for (const origin of origins) {
    await runBound(
      sequelize,
      'UPDATE loan_prints SET left_from_location_id = ? WHERE loan_id = ? AND print_id = ?',
      [origin.locationId, loanId, origin.printId],
      transaction,
    );
  }
}

/** Which of a print's condition reports exist, by id. */
export async function reportPrints(
  sequelize: Sequelize,
  reportIds: readonly number[],
  transaction: Transaction,
): Promise<Map<number, number>> {
  if (!reportIds.length) return new Map();
  const rows = await selectRows<{ id: number; print_id: number }>(
    sequelize,
    `SELECT id, print_id FROM condition_reports WHERE id IN (${reportIds.map(() => '?').join(', ')})`,
    reportIds,
    transaction,
  );
  return new Map(rows.map((row) => [row.id, row.print_id]));
}

/** The grade of each condition report named. */
export async function reportGrades(
  sequelize: Sequelize,
  reportIds: readonly number[],
): Promise<Map<number, string | null>> {
  if (!reportIds.length) return new Map();
  const rows = await selectRows<{ id: number; grade: string | null; reported_on: string }>(
    sequelize,
    `SELECT id, grade, reported_on FROM condition_reports WHERE id IN (${reportIds.map(() => '?').join(', ')})`,
    reportIds,
  );
  return new Map(rows.map((row) => [row.id, row.grade]));
}

/** A print's display period on a loan that counts towards its light dose. */
export interface DosePeriodRow {
  print_id: number;
  loan_id: number;
  starts_on: string;
  ends_on: string;
  max_lux: number;
  hours_per_day: number;
}

/** Display periods of agreed, away and returned loans: of some prints, or of all. */
export async function findDosePeriods(
  sequelize: Sequelize,
  printIds?: readonly number[],
): Promise<DosePeriodRow[]> {
  const stages = DOSE_STAGES.map(() => '?').join(', ');
  const only = printIds ? `AND lp.print_id IN (${printIds.map(() => '?').join(', ')})` : '';
  if (printIds && printIds.length === 0) return [];
  const rows = await selectRows<DosePeriodRow>(
    sequelize,
    `SELECT lp.print_id, l.id AS loan_id, l.starts_on, l.ends_on, l.max_lux, l.hours_per_day
     FROM loan_prints lp JOIN loans l ON l.id = lp.loan_id
     WHERE l.stage IN (${stages}) ${only}`,
    [...DOSE_STAGES, ...(printIds ?? [])],
  );
  return rows.map((row) => ({
    ...row,
    starts_on: day(row.starts_on)!,
    ends_on: day(row.ends_on)!,
  }));
}
