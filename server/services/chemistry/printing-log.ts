import { totalMinutes } from '../../../shared/domain/processing';
import { suggestExposure, sameLight } from '../../../shared/domain/printing-log';
import type { PrintingLogEntry, PrintingLogView } from '../../../shared/types/chemistry';
import { problems } from '../../middleware/problem';
import { Negative, Paper, Print, ProcessingStep } from '../../models';

/** A negative's log; its route presents the negative itself. */
export type PrintingLogParts = Omit<PrintingLogView, 'negative'> & { negative: Negative };

/** Every print made from a negative, oldest first, with a starting exposure per paper and light. */
export async function loadPrintingLog(negativeId: number): Promise<PrintingLogParts> {
  const negative = await Negative.findByPk(negativeId);
  if (!negative) throw problems.notFound('The negative');
  const prints = await Print.findAll({
    where: { negativeId },
    include: [
      { model: Paper, as: 'paper', attributes: ['id', 'name'] },
      { model: ProcessingStep, as: 'processing', where: { stage: 'exposure' }, required: false },
    ],
    order: [
      ['madeFrom', 'ASC NULLS LAST'],
      ['accessionNumber', 'ASC'],
    ],
  });
  const entries: PrintingLogEntry[] = prints.map((print) => {
    const exposures = print.processing ?? [];
    return {
      id: print.id,
      accessionNumber: print.accessionNumber,
      title: print.title,
      madeOn: print.madeOn,
      paper: print.paper ? { id: print.paper.id, name: print.paper.name } : null,
      lightSource: exposures.find((step) => step.lightSource)?.lightSource ?? null,
      exposureMinutes: totalMinutes(exposures, 'exposure'),
      toneStatus: print.toneStatus,
    };
  });
  return {
    negative,
    prints: entries,
    suggestions: suggestions(entries),
  };
}

/** One suggestion for each paper and light source already used with the negative. */
function suggestions(entries: PrintingLogEntry[]): PrintingLogView['suggestions'] {
  const log = entries.map((entry) => ({ ...entry, paperId: entry.paper?.id ?? null }));
  const groups: PrintingLogView['suggestions'] = [];
  for (const entry of entries) {
    if (!entry.lightSource || entry.exposureMinutes == null) continue;
    const paperId = entry.paper?.id ?? null;
    const seen = groups.some(
      (group) =>
        (group.paper?.id ?? null) === paperId && sameLight(group.lightSource, entry.lightSource),
    );
    if (seen) continue;
    const suggestion = suggestExposure(log, { paperId, lightSource: entry.lightSource });
    if (suggestion) groups.push({ paper: entry.paper, lightSource: entry.lightSource, suggestion });
  }
  return groups;
}
