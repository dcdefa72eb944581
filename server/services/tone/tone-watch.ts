import { Op, type WhereOptions } from 'sequelize';
import { toneTrend } from '../../../shared/domain/tone/trend';
import type { ToneWatchQuery } from '../../../shared/schemas/tone';
import type { ToneWatchItem } from '../../../shared/types/tone';
import { Location, Paper, Print, ToneCheck } from '../../models';
import { descendantIds } from '../locations/location-paths';
import { sparklineOf } from './read-tone';
import { loadToneSettings } from './settings-store';

const ATTENTION = ['watch', 'fading', 'darkening', 'yellowing'];
const LIMIT = 100;

const today = () => new Date().toISOString().slice(0, 10);

/** Prints needing attention (a changing or watched status, or a check overdue), most urgent first. */
export async function toneWatchList(
  query: ToneWatchQuery,
): Promise<{ items: ToneWatchItem[]; total: number }> {
  const now = today();
  const and: WhereOptions<Print>[] = [];
  if (query.scope === 'attention') {
    and.push({
      [Op.or]: [{ toneStatus: ATTENTION }, { nextCheckDue: { [Op.lt]: now } }],
    } as WhereOptions<Print>);
  }
  if (query.status) and.push({ toneStatus: query.status });
  if (query.paperId) and.push({ paperId: query.paperId });
  if (query.locationId) and.push({ locationId: [...(await descendantIds(query.locationId))] });
  const where = { [Op.and]: and };
  // Counted without the joins: a count over the joined rows cost a second full pass.
  const count = await Print.count({ where });
  const rows = await Print.findAll({
    where,
    attributes: [
      'id',
      'accessionNumber',
      'title',
      'toneStatus',
      'toneFlags',
      'nextCheckDue',
      'paperId',
      'locationId',
    ],
    include: [
      { model: Paper, as: 'paper', attributes: ['id', 'name'] },
      { model: Location, as: 'location', attributes: ['id', 'code'] },
    ],
    order: [
      ['toneUrgency', 'DESC'],
      ['nextCheckDue', 'ASC'],
      ['id', 'ASC'],
    ],
    limit: LIMIT,
  });
  const lines = await sparklines(rows.map((row) => row.id));
  return {
    total: count,
    items: rows.map((print) => ({
      print: {
        id: print.id,
        accessionNumber: print.accessionNumber,
        title: print.title,
        paper: print.paper ? { id: print.paper.id, name: print.paper.name } : null,
        location: print.location ? { id: print.location.id, code: print.location.code } : null,
      },
      status: print.toneStatus,
      flags: print.toneFlags,
      reasons: print.toneFlags.map((flag) => flag.reason),
      nextCheckDue: print.nextCheckDue,
      overdue: print.nextCheckDue !== null && print.nextCheckDue < now,
      sparkline: lines.get(print.id) ?? [],
    })),
  };
}

async function sparklines(printIds: number[]): Promise<Map<number, number[]>> {
  if (printIds.length === 0) return new Map();
  const { noticeableDE00 } = (await loadToneSettings()).tone;
  const checks = await ToneCheck.findAll({
    where: { printId: printIds },
    attributes: ['id', 'printId', 'checkedOn', 'baseline', 'readings'],
  });
  const byPrint = new Map<number, ToneCheck[]>();
  for (const check of checks) {
    byPrint.set(check.printId, [...(byPrint.get(check.printId) ?? []), check]);
  }
  const result = new Map<number, number[]>();
  for (const [printId, list] of byPrint) {
    result.set(printId, sparklineOf(toneTrend(list, noticeableDE00)));
  }
  return result;
}
