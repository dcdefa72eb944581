import { currentSeries } from '../../../shared/domain/tone/baseline';
import { compareWithBaseline } from '../../../shared/domain/tone/comparison';
import { evaluatePrintChecks } from '../../../shared/domain/tone/evaluate';
import type { PatchTrend } from '../../../shared/domain/tone/trend';
import type { ToneChecksResponse, ToneTrendResponse } from '../../../shared/types/tone';
import { ToneCheck, User } from '../../models';
import { presentToneCheck } from '../../presenters/tone';
import { assertPrintExists } from '../prints/assert-print-exists';
import { loadToneSettings } from './settings-store';

/** Every check of a print, newest first, with the latest comparison against the baseline. */
export async function listToneChecks(printId: number): Promise<ToneChecksResponse> {
  await assertPrintExists(printId);
  const checks = await ToneCheck.findAll({
    where: { printId },
    include: [{ model: User, as: 'checker' }],
    order: [
      ['checkedOn', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  const current = currentSeries(checks);
  const latest = current?.series[current.series.length - 1];
  return {
    items: checks.map(presentToneCheck),
    baselineId: current?.baseline.id ?? null,
    latestComparison:
      current && latest ? compareWithBaseline(current.baseline.readings, latest.readings) : [],
  };
}

/** The contract's tone trend of one print. */
export async function printToneTrend(printId: number): Promise<ToneTrendResponse> {
  await assertPrintExists(printId);
  const checks = await ToneCheck.findAll({ where: { printId } });
  const settings = await loadToneSettings();
  const state = evaluatePrintChecks(checks, settings);
  const { watchDE00, noticeableDE00 } = settings.tone;
  return {
    thresholds: { watchDE00, noticeableDE00 },
    status: state.status,
    flags: state.flags,
    nextCheckDue: state.nextCheckDue,
    patches: state.trend,
  };
}

/** ΔE00 at each check of the patch that has changed most, for a small line in lists. */
export function sparklineOf(trend: readonly PatchTrend[]): number[] {
  let best: PatchTrend | undefined;
  for (const patch of trend) {
    const last = patch.series[patch.series.length - 1]?.dE00 ?? 0;
    const bestLast = best?.series[best.series.length - 1]?.dE00 ?? -1;
    if (last > bestLast) best = patch;
  }
  return best ? best.series.map((point) => Number(point.dE00.toFixed(2))) : [];
}
