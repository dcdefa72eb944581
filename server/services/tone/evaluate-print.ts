import type { Transaction } from 'sequelize';
import type { PrintToneState } from '../../../shared/domain/tone/evaluate';
import type { ToneSettings } from '../../../shared/domain/tone/settings';
import { Print } from '../../models';
import { evaluatePrints, type ToneEvaluation } from './evaluate-prints';
import type { DecodedCheck } from './tone-inputs';

/**
 * One print's tone state after a check changed: the same set-based evaluation as every
 * print after a settings change (`evaluatePrints`), for a set of one. Returns the new state
 * and the print's checks as the evaluation read them.
 */
export async function evaluateStoredPrint(
  printId: number,
  settings: ToneSettings,
  transaction: Transaction,
): Promise<PrintToneState & { checks: DecodedCheck[] }> {
  const result = await evaluatePrints(Print.sequelize!, settings, { ids: [printId] }, transaction);
  return stateOfPrint(result, printId);
}

/** One print's new state and checks from an evaluation by ids. */
export function stateOfPrint(
  evaluation: ToneEvaluation,
  printId: number,
): PrintToneState & { checks: DecodedCheck[] } {
  const state = evaluation.states.get(printId);
  if (!state) throw new Error(`print ${printId} vanished during evaluation`);
  return { ...state, checks: evaluation.checksOf.get(printId) ?? [] };
}
