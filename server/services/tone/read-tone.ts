import { currentSeries } from '../../../shared/domain/tone/baseline';
import { compareWithBaseline } from '../../../shared/domain/tone/comparison';
import { evaluatePrintChecks } from '../../../shared/domain/tone/evaluate';
import type { ToneChecksResponse, ToneTrendResponse } from '../../../shared/types/tone';
import { Print, ToneCheck, User } from '../../models';
import { presentToneCheck } from '../../presenters/tone';
import { assertPrintExists } from '../prints/assert-print-exists';
import { loadToneSettings } from './settings-store';

/** Every check of a print, newest first, with the latest comparison against the baseline. */
export async function listToneChecks(printId: number): Promise<ToneChecksResponse> {
  await assertPrintExists(printId);
  const checks = await ToneCheck.findAll({
    where: { printId },
    include: [{ model: User, as: 'checker', attributes: ['id', 'name'] }],
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
  // The stored status is the one that stands (hysteresis keeps it through small changes).
  const print = await Print.findByPk(printId, { attributes: ['id', 'toneStatus'] });
  const state = evaluatePrintChecks(checks, settings, print?.toneStatus);
  const { watchDE00, noticeableDE00, projectionYears } = settings.tone;
  return {
    thresholds: { watchDE00, noticeableDE00, projectionYears },
    status: state.status,
    flags: state.flags,
    nextCheckDue: state.nextCheckDue,
    patches: state.trend,
  };
}
