import type { Transaction } from 'sequelize';
import { evaluatePrintChecks, type PrintToneState } from '../../../shared/domain/tone/evaluate';
import type { ToneSettings } from '../../../shared/domain/tone/settings';
import type { ToneStatus } from '../../../shared/domain/vocabulary';
import { notePrintsChanged } from '../../db/prints-changed';
import { Alert, Print, ToneCheck } from '../../models';
import { rederiveProcessingRisk } from '../prints/processing-risk';

/** Why an alert opens when a print's status changes; from `unchecked` nothing opens. */
export function statusChangeAlert(
  before: ToneStatus,
  state: Pick<PrintToneState, 'status' | 'flags'>,
): { kind: string; reason: string } | null {
  if (before === state.status || before === 'unchecked' || state.status === 'unchecked') {
    return null;
  }
  const top = state.flags.find((flag) => flag.kind === state.status);
  const detail = top ? `: ${top.reason}` : '';
  return { kind: state.status, reason: `Tone status ${before} → ${state.status}${detail}` };
}

/** One change opens one alert: an unacknowledged alert of the same kind already says it. */
async function hasOpenAlert(printId: number, kind: string, transaction: Transaction) {
  const open = await Alert.findOne({
    where: { printId, kind, acknowledgedAt: null },
    attributes: ['id'],
    transaction,
  });
  return open !== null;
}

/**
 * Stores a print's tone state from its checks (status, flags, next check, baseline, rate,
 * small line), re-derives its processing-risk reasons when the baseline date moved (that
 * date is an input of one rule; nothing else a check changes is), and opens an alert when
 * the status changed. The print is noted as changed, so the search index (tone status is a
 * filter and facet) has it before the write answers. A caller that has just read the print
 * or its checks in the same transaction passes them, so they are not read twice.
 */
export async function evaluateStoredPrint(
  printId: number,
  settings: ToneSettings,
  transaction: Transaction,
  known: { print?: Print; checks?: ToneCheck[] } = {},
): Promise<PrintToneState> {
  const print = known.print ?? (await Print.findByPk(printId, { transaction, paranoid: false }));
  if (!print) throw new Error(`print ${printId} vanished during evaluation`);
  const checks = known.checks ?? (await ToneCheck.findAll({ where: { printId }, transaction }));
  const state = evaluatePrintChecks(checks, settings, print.toneStatus);
  const alert = statusChangeAlert(print.toneStatus, state);
  const baselineMoved = print.toneBaselineOn !== state.baselineOn;
  await print.update(
    {
      toneStatus: state.status,
      toneFlags: state.flags,
      toneUrgency: state.urgency,
      nextCheckDue: state.nextCheckDue,
      toneBaselineOn: state.baselineOn,
      toneRatePerYear: state.ratePerYear,
      toneSparkline: state.sparkline,
    },
    { transaction, silent: true },
  );
  notePrintsChanged(transaction, [printId], 'tone');
  if (baselineMoved) await rederiveProcessingRisk([printId], transaction);
  if (alert && !(await hasOpenAlert(printId, alert.kind, transaction)))
    await Alert.create({ printId, ...alert, openedAt: new Date() }, { transaction });
  return state;
}
