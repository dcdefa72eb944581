import type { Sequelize, Transaction } from 'sequelize';
import { mayMoveStage, type LoanStage } from '../../../shared/domain/loans';
import { roleCan, type Role } from '../../../shared/domain/roles';
import { todayIso } from '../../../shared/domain/tone/check-date';
import { CONDITION_FIELDS, type LoanCreate, type LoanUpdate } from '../../../shared/schemas/loan';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import type { User } from '../../models';
import {
  findLoanPrints,
  findLoanRow,
  findLoanRows,
  insertLoan,
  replaceLoanPrints,
  reportPrints,
  setLeftFrom,
  setLoanPrintReports,
  updateLoanRow,
  type LoanColumns,
  type LoanPrintRow,
  type LoanRow,
} from '../../repositories/loan-repository';
import { livePrintPlaces } from '../../repositories/movement-repository';
import { locationStore } from '../../repositories/reference-repository';
import { recordAudit } from '../audit';
import { movePrints } from '../movements/move-prints';
import { lightPlan } from './light';

interface Ctx {
  sequelize: Sequelize;
  user: User;
}

/** A loan with its prints and what it would do to their light. */
export interface LoanRecord {
  loan: LoanRow;
  prints: LoanPrintRow[];
  light: Awaited<ReturnType<typeof lightPlan>>;
}

const columnsOf = (input: Partial<LoanCreate>): LoanColumns => {
  const columns: LoanColumns = {};
  if (input.title !== undefined) columns.title = input.title;
  if (input.kind !== undefined) columns.kind = input.kind;
  if (input.venue !== undefined) columns.venue = input.venue;
  if (input.contact !== undefined) columns.contact = input.contact;
  if (input.startsOn !== undefined) columns.starts_on = input.startsOn;
  if (input.endsOn !== undefined) columns.ends_on = input.endsOn;
  if (input.hoursPerDay !== undefined) columns.hours_per_day = input.hoursPerDay;
  if (input.maxLux !== undefined) columns.max_lux = input.maxLux;
  if (input.maxUv !== undefined) columns.max_uv = input.maxUv ?? null;
  if (input.temperatureC !== undefined) {
    columns.temperature_min = input.temperatureC?.min ?? null;
    columns.temperature_max = input.temperatureC?.max ?? null;
  }
  if (input.humidityPercent !== undefined) {
    columns.humidity_min = input.humidityPercent?.min ?? null;
    columns.humidity_max = input.humidityPercent?.max ?? null;
  }
  return columns;
};

async function assertPrints(ctx: Ctx, printIds: readonly number[], transaction: Transaction) {
  const live = await livePrintPlaces(ctx.sequelize, printIds, transaction);
  const unknown = printIds.filter((id) => !live.has(id));
  if (unknown.length) {
    throw problems.invalid([
      { path: 'printIds', message: `No print with id ${unknown.slice(0, 5).join(', ')}` },
    ]);
  }
}

/** Reads a loan whole; 404 when unknown. */
export async function readLoan(sequelize: Sequelize, id: number): Promise<LoanRecord> {
  const loan = await findLoanRow(sequelize, id);
  if (!loan) throw problems.notFound('The loan');
  const prints = await findLoanPrints(sequelize, id);
  const light = await lightPlan(
    sequelize,
    loan,
    prints.map((print) => ({ printId: print.print_id, process: print.process })),
  );
  return { loan, prints, light };
}

export const listLoans = (sequelize: Sequelize) => findLoanRows(sequelize);

/** A new loan or exhibition, proposed; its prints in the order given. */
export async function createLoan(ctx: Ctx, input: LoanCreate): Promise<number> {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    await assertPrints(ctx, input.printIds, transaction);
    const id = await insertLoan(
      ctx.sequelize,
      { ...columnsOf(input), stage: 'proposed', created_by: ctx.user.id },
      transaction,
    );
    await replaceLoanPrints(ctx.sequelize, id, input.printIds, transaction);
    await recordAudit(
      { user: ctx.user, action: 'create', entity: 'loan', entityId: id, after: input },
      transaction,
    );
    return id;
  });
}

/** Refuses what the caller's role may not change (403): conditions and moving prints. */
export function checkLoanChange(role: Role, input: LoanUpdate): void {
  const touchesConditions =
    CONDITION_FIELDS.some((field) => input[field] !== undefined) ||
    input.conditionsSigned !== undefined ||
    input.conditionReports !== undefined;
  if (touchesConditions && !roleCan(role, 'condition:write')) {
    throw problems.forbidden('Only a conservator or an admin sets and signs the conditions.');
  }
  if ((input.stage === 'away' || input.stage === 'back') && !roleCan(role, 'prints:move')) {
    throw problems.forbidden('Only an archivist or an admin moves the prints out and back.');
  }
}

/** Changes a loan: fields, prints, conditions and their signature, reports, and its stage. */
export async function updateLoan(ctx: Ctx, id: number, input: LoanUpdate): Promise<void> {
  checkLoanChange(ctx.user.role, input);
  await writeTransaction(ctx.sequelize, async (transaction) => {
    const before = await findLoanRow(ctx.sequelize, id, transaction);
    if (!before) throw problems.notFound('The loan');
    const { stage, conditionsSigned, conditionReports, printIds, ...fields } = input;
    const columns = columnsOf(fields);
    const starts = columns.starts_on ?? before.starts_on;
    const ends = columns.ends_on ?? before.ends_on;
    if (starts > ends) {
      throw problems.invalid([
        { path: 'endsOn', message: 'The end must not come before the start' },
      ]);
    }
    // New conditions need signing again.
    if (CONDITION_FIELDS.some((field) => fields[field] !== undefined)) {
      columns.conditions_signed_by = null;
      columns.conditions_signed_on = null;
    }
    if (conditionsSigned === true) {
      columns.conditions_signed_by = ctx.user.id;
      columns.conditions_signed_on = todayIso();
    } else if (conditionsSigned === false) {
      columns.conditions_signed_by = null;
      columns.conditions_signed_on = null;
    }
    if (printIds) {
      if (before.stage !== 'proposed' && before.stage !== 'agreed') {
        throw problems.conflict('The prints of a loan that has left cannot change.');
      }
      await assertPrints(ctx, printIds, transaction);
      await replaceLoanPrints(ctx.sequelize, id, printIds, transaction);
    }
    if (Object.keys(columns).length) await updateLoanRow(ctx.sequelize, id, columns, transaction);
    if (conditionReports) await linkReports(ctx, id, conditionReports, transaction);
    if (stage && stage !== before.stage) await changeStage(ctx, id, stage, transaction);
    const after = await findLoanRow(ctx.sequelize, id, transaction);
    await recordAudit(
      { user: ctx.user, action: 'update', entity: 'loan', entityId: id, before, after },
      transaction,
    );
  });
}

async function linkReports(
  ctx: Ctx,
  loanId: number,
  links: NonNullable<LoanUpdate['conditionReports']>,
  transaction: Transaction,
): Promise<void> {
  const onLoan = new Set(
    (await findLoanPrints(ctx.sequelize, loanId, transaction)).map((row) => row.print_id),
  );
  const ids = links.flatMap((link) =>
    [link.departureReportId, link.returnReportId].filter((value): value is number => !!value),
  );
  const owners = await reportPrints(ctx.sequelize, ids, transaction);
  links.forEach((link, index) => {
    if (!onLoan.has(link.printId)) {
      throw problems.invalid([
        { path: `conditionReports.${index}.printId`, message: 'That print is not on this loan' },
      ]);
    }
    for (const key of ['departureReportId', 'returnReportId'] as const) {
      const reportId = link[key];
      if (reportId && owners.get(reportId) !== link.printId) {
        throw problems.invalid([
          { path: `conditionReports.${index}.${key}`, message: 'No such report of that print' },
        ]);
      }
    }
  });
  for (const link of links) await setLoanPrintReports(ctx.sequelize, loanId, link, transaction);
}

/** Moves a loan on; the prints go out to the loan's place and back through movements. */
async function changeStage(
  ctx: Ctx,
  loanId: number,
  stage: LoanStage,
  transaction: Transaction,
): Promise<void> {
  const loan = (await findLoanRow(ctx.sequelize, loanId, transaction))!;
  if (!mayMoveStage(loan.stage, stage)) {
    throw problems.conflict(`A loan cannot go from ${loan.stage} to ${stage}.`);
  }
  if (stage === 'agreed' && !loan.conditions_signed_on) {
    throw problems.conflict('A conservator signs the conditions before the loan is agreed.');
  }
  const prints = await findLoanPrints(ctx.sequelize, loanId, transaction);
  const movedOn = todayIso();
  const columns: LoanColumns = { stage };
  if (stage === 'away' && prints.length) {
    let awayId = loan.away_location_id;
    if (!awayId) {
      const place = await locationStore.create(
        {
          code: `LOAN-${loanId}`,
          name: `${loan.kind === 'loan' ? 'On loan' : 'On show'}: ${loan.venue}`,
        },
        transaction,
      );
      awayId = place.id;
      columns.away_location_id = awayId;
    }
    await setLeftFrom(
      ctx.sequelize,
      loanId,
      prints.map((print) => ({ printId: print.print_id, locationId: print.location_id })),
      transaction,
    );
    const reason = loan.kind === 'loan' ? 'loan' : 'display';
    await movePrints(
      ctx,
      { printIds: prints.map((print) => print.print_id), toLocationId: awayId, reason, movedOn },
      transaction,
    );
  }
  if (stage === 'back') {
    const byOrigin = new Map<number, number[]>();
    for (const print of prints) {
      if (print.left_from_location_id === null) continue;
      const list = byOrigin.get(print.left_from_location_id) ?? [];
      list.push(print.print_id);
      byOrigin.set(print.left_from_location_id, list);
    }
    for (const [toLocationId, printIds] of byOrigin) {
      await movePrints(ctx, { printIds, toLocationId, reason: 'return', movedOn }, transaction);
    }
  }
  await updateLoanRow(ctx.sequelize, loanId, columns, transaction);
}
