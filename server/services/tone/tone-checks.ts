import type { Transaction } from 'sequelize';
import { currentSeries } from '../../../shared/domain/tone/baseline';
import { checkDateProblem } from '../../../shared/domain/tone/check-date';
import { compareWithBaseline } from '../../../shared/domain/tone/comparison';
import { measuredBeforeDryDown } from '../../../shared/domain/tone-processing-risk';
import type { ToneCheckCreate, ToneCheckUpdate } from '../../../shared/schemas/tone';
import type { PrintToneState } from '../../../shared/domain/tone/evaluate';
import type { ToneCheckResponse } from '../../../shared/types/tone';
import { together } from '../../db/together';
import { recordNotedChanges } from '../../db/prints-changed';
import { writeGroups } from '../../db/write-groups';
import { writeTransaction } from '../../db/write-transaction';
import { problems, type HttpProblem } from '../../middleware/problem';
import { Print, ToneCheck, User } from '../../models';
import { presentToneCheck } from '../../presenters/tone';
import {
  findLivePrintDates,
  insertToneCheck,
  type LivePrintDates,
} from '../../repositories/tone-check-repository';
import { recordAudit } from '../audit';
import type { PrintCommandContext } from '../prints/print-command';
import { evaluateStoredPrint, stateOfPrint } from './evaluate-print';
import { evaluateToneInputs } from './evaluate-prints';
import { readToneInputs, withCheckRow, type DecodedCheck } from './tone-inputs';
import { loadToneSettings } from './settings-store';

type Ctx = Pick<PrintCommandContext, 'sequelize' | 'user'>;

/** The live print with what a check needs of it (its dates). */
async function livePrint(printId: number, transaction: Transaction): Promise<LivePrintDates> {
  const print = await findLivePrintDates(Print.sequelize!, printId, transaction);
  if (!print) throw problems.notFound('The print');
  return print;
}

/** The 422 for a check dated after today or before the print was made; null when it may. */
function checkDateRefusal(checkedOn: string, print: LivePrintDates): HttpProblem | null {
  const problem = checkDateProblem(checkedOn, print.madeFrom);
  return problem ? problems.invalid([{ path: 'checkedOn', message: problem }]) : null;
}

function assertCheckDate(checkedOn: string, print: LivePrintDates): void {
  const refusal = checkDateRefusal(checkedOn, print);
  if (refusal) throw refusal;
}

async function findCheck(id: number, transaction: Transaction): Promise<ToneCheck> {
  const check = await ToneCheck.findByPk(id, {
    transaction,
    include: [{ model: User, as: 'checker', attributes: ['id', 'name'] }],
  });
  if (!check) throw problems.notFound('The tone check');
  if (!(await Print.findByPk(check.printId, { transaction }))) throw problems.notFound('The print');
  return check;
}

/** The check with its comparison against the baseline, warnings and the print's new state. */
function respond(
  check: ToneCheck,
  print: LivePrintDates,
  state: PrintToneState & { checks: DecodedCheck[] },
): ToneCheckResponse {
  const baseline = currentSeries(state.checks)!.baseline;
  const comparison = compareWithBaseline(baseline.readings, check.readings);
  const warnings: string[] = [];
  if (
    baseline.id === check.id &&
    measuredBeforeDryDown(print.madeFrom, print.madeTo, check.checkedOn)
  ) {
    warnings.push(
      'This baseline was measured on the day the print was made: tones keep shifting as a print dries down (common practice). A baseline a few weeks later is a fairer reference.',
    );
  }
  const missing = check.readings.filter((r) => !baseline.readings.some((b) => b.patch === r.patch));
  if (missing.length > 0 && baseline.id !== check.id) {
    warnings.push(
      `No baseline reading for ${missing.map((r) => r.patch).join(', ')}: not compared.`,
    );
  }
  return {
    ...presentToneCheck(check),
    comparison,
    baselineId: baseline.id,
    warnings,
    tone: { status: state.status, flags: state.flags, nextCheckDue: state.nextCheckDue },
  };
}

interface LogCheck {
  ctx: Ctx;
  printId: number;
  input: ToneCheckCreate;
}

/**
 * Logs a check on a print, re-evaluates the print, and audits the new check. Checks logged
 * at the same moment, on one print or many, are written in one transaction
 * (`db/write-groups.ts`): one read of their prints and checks, one evaluation, one event.
 */
export function createToneCheck(
  ctx: Ctx,
  printId: number,
  input: ToneCheckCreate,
): Promise<ToneCheckResponse> {
  return logChecks(ctx.sequelize, { ctx, printId, input });
}

const logChecks = writeGroups<LogCheck, ToneCheckResponse>(async (logs, transaction, refuse) => {
  const sequelize = logs[0]!.ctx.sequelize;
  const ids = [...new Set(logs.map(({ printId }) => printId))];
  // Statements that do not depend on each other go together (`db/together.ts`): every wait
  // inside the lock is paid by each writer queued behind. The prints' tone inputs are read
  // before the inserts, which then join them.
  const [prints, settings, inputs] = await together(
    together(...ids.map((id) => findLivePrintDates(sequelize, id, transaction))),
    loadToneSettings(transaction),
    readToneInputs(sequelize, { ids }, transaction),
  );
  const printOf = new Map(ids.map((id, i) => [id, prints[i]]));
  const kept: Array<LogCheck & { index: number; print: LivePrintDates }> = [];
  logs.forEach((log, index) => {
    const print = printOf.get(log.printId);
    const refusal = print
      ? checkDateRefusal(log.input.checkedOn, print)
      : problems.notFound('The print');
    if (refusal) return refuse(index, refusal);
    kept.push({ ...log, index, print: print! });
  });
  const checks = await together<ToneCheck[]>(
    ...kept.map(({ ctx, printId, input }) =>
      insertToneCheck(sequelize, { ...input, printId, checkedBy: ctx.user.id }, transaction),
    ),
  );
  let withRows = inputs;
  kept.forEach(({ ctx, printId }, i) => {
    const check = checks[i]!;
    check.checker = ctx.user;
    withRows = withCheckRow(withRows, {
      id: check.id,
      print_id: printId,
      checked_on: check.checkedOn,
      baseline: check.baseline,
      readings: JSON.stringify(check.readings),
    });
  });
  // The audit rows and the change-feed row go with the evaluation's writes.
  const evaluation = await evaluateToneInputs(sequelize, settings, withRows, transaction, () => [
    ...kept.map(({ ctx }, i) =>
      audit(ctx, 'create', checks[i]!.id, { after: presentToneCheck(checks[i]!) }, transaction),
    ),
    recordNotedChanges(sequelize, transaction),
  ]);
  const answers: ToneCheckResponse[] = [];
  kept.forEach(({ index, print, printId }, i) => {
    answers[index] = respond(checks[i]!, print, stateOfPrint(evaluation, printId));
  });
  return answers;
});

/** Corrects a check; the audit trail keeps the readings before and after. */
export function updateToneCheck(
  ctx: Ctx,
  id: number,
  input: ToneCheckUpdate,
): Promise<ToneCheckResponse> {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const check = await findCheck(id, transaction);
    const print = await livePrint(check.printId, transaction);
    if (input.checkedOn) assertCheckDate(input.checkedOn, print);
    const before = presentToneCheck(check);
    await check.update(input, { transaction });
    await audit(ctx, 'update', id, { before, after: presentToneCheck(check) }, transaction);
    const settings = await loadToneSettings(transaction);
    return respond(check, print, await evaluateStoredPrint(print.id, settings, transaction));
  });
}

/** Deletes a check (audited) and re-evaluates its print. */
export function deleteToneCheck(ctx: Ctx, id: number): Promise<void> {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    const check = await findCheck(id, transaction);
    await audit(ctx, 'delete', id, { before: presentToneCheck(check) }, transaction);
    await check.destroy({ transaction });
    await evaluateStoredPrint(check.printId, await loadToneSettings(transaction), transaction);
  });
}

function audit(
  ctx: Ctx,
  action: 'create' | 'update' | 'delete',
  entityId: number,
  states: { before?: unknown; after?: unknown },
  transaction: Transaction,
): Promise<void> {
  return recordAudit(
    { user: ctx.user, action, entity: 'tone-check', entityId, ...states },
    transaction,
  );
}
