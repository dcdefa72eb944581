import type { Transaction } from 'sequelize';
import { evaluatePrintChecks, type PrintToneState } from '../../../shared/domain/tone/evaluate';
import type { ToneSettings } from '../../../shared/domain/tone/settings';
import type { ToneStatus } from '../../../shared/domain/vocabulary';
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

/**
 * Re-reads a print's checks, stores its tone state (status, flags, next check, baseline,
 * rate) and its processing-risk reasons (the baseline date is one of their inputs), and
 * opens an alert when the status changed.
 */
export async function evaluateStoredPrint(
  printId: number,
  settings: ToneSettings,
  transaction: Transaction,
): Promise<PrintToneState> {
  const print = await Print.findByPk(printId, { transaction, paranoid: false });
  if (!print) throw new Error(`print ${printId} vanished during evaluation`);
  const checks = await ToneCheck.findAll({ where: { printId }, transaction });
  const state = evaluatePrintChecks(checks, settings);
  const alert = statusChangeAlert(print.toneStatus, state);
  await print.update(
    {
      toneStatus: state.status,
      toneFlags: state.flags,
      toneUrgency: state.urgency,
      nextCheckDue: state.nextCheckDue,
      toneBaselineOn: state.baselineOn,
      toneRatePerYear: state.ratePerYear,
    },
    { transaction, silent: true },
  );
  // The baseline date is an input of the risk rules: store every rule's reasons again.
  await rederiveProcessingRisk([printId], transaction);
  if (alert) await Alert.create({ printId, ...alert, openedAt: new Date() }, { transaction });
  return state;
}
