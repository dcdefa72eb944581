import { QueryTypes, type Sequelize } from 'sequelize';
import { isCheckOverdue } from '../../../shared/domain/tone/check-date';
import { evaluatePrintChecks } from '../../../shared/domain/tone/evaluate';
import type { ToneFlag } from '../../../shared/domain/tone/status';
import { TONE_STATUSES, type ToneStatus } from '../../../shared/domain/vocabulary';
import type { ToneWatchQuery } from '../../../shared/schemas/tone';
import type { ToneWatchItem } from '../../../shared/types/tone';
import { writeGeneration } from '../../db/write-transaction';
import { Print, ToneCheck } from '../../models';
import { descendantIds } from '../locations/location-paths';
import { loadToneSettings } from './settings-store';
import { readJson } from '../../repositories/decode-columns';
import { dialectOf, type SqlDialect } from '../../db/dialect';

const ATTENTION: readonly string[] = ['watch', 'fading', 'darkening', 'yellowing'];
/** "Overdue" is asked of the other statuses only, so each branch of the OR is one range of
 * the (tone_status, next_check_due) index. */
const CALM = TONE_STATUSES.filter((status) => !ATTENTION.includes(status));
const LIMIT = 100;

const today = () => new Date().toISOString().slice(0, 10);

interface WatchRow {
  id: number;
  accession_number: string;
  title: string;
  tone_status: ToneStatus;
  tone_flags: string;
  next_check_due: string | null;
  tone_sparkline: string | null;
  paper_id: number | null;
  paper_name: string | null;
  location_id: number | null;
  location_code: string | null;
}

/** The WHERE of the list and its count, over live prints, with its replacements. */
async function conditions(query: ToneWatchQuery, now: string, dialect: SqlDialect) {
  const where = ['p.deleted_at IS NULL'];
  const values: Record<string, unknown> = { now, attention: ATTENTION, calm: CALM };
  if (query.scope === 'attention') {
    where.push(
      '(p.tone_status IN (:attention) OR (p.tone_status IN (:calm) AND p.next_check_due < :now))',
    );
  }
  if (query.status) {
    where.push('p.tone_status = :status');
    values.status = query.status;
  }
  if (query.paperId) {
    where.push('p.paper_id = :paperId');
    values.paperId = query.paperId;
  }
  if (query.locationId) {
    where.push('p.location_id IN (:locations)');
    values.locations = [...(await descendantIds(query.locationId))];
  }
  // With only the tone filters, both partial indexes of migration 0009 cover the query. Named
  // through the dialect: without ANALYZE statistics SQLite takes `deleted_at IS NULL` for a
  // selective equality and sorted every live print through the deleted_at index (93 ms at
  // 100,000); PostgreSQL's planner needs no name.
  const toneOnly = !query.paperId && !query.locationId;
  return {
    sql: where.join(' AND '),
    values,
    countIndex: toneOnly ? dialect.indexHint('prints_tone_watch_due') : '',
    pageIndex: toneOnly ? dialect.indexHint('prints_tone_watch_order') : '',
  };
}

/**
 * Prints needing attention (a changing or watched status, or a check overdue), most urgent
 * first. Read in SQL without model building: the order is that of the partial index
 * prints_tone_watch_order (migration 0009), so the page is the first 100 matches of an
 * index walk rather than a sort of every match.
 */
export async function toneWatchList(
  query: ToneWatchQuery,
): Promise<{ items: ToneWatchItem[]; total: number }> {
  const sequelize = Print.sequelize!;
  const now = today();
  const { sql, values, countIndex, pageIndex } = await conditions(query, now, dialectOf(sequelize));
  const total = await countOnce(sequelize, `${now}|${JSON.stringify(query)}`, async () => {
    const [row] = await sequelize.query<{ total: number }>(
      `SELECT COUNT(*) AS total FROM prints p ${countIndex} WHERE ${sql}`,
      { type: QueryTypes.SELECT, replacements: values },
    );
    return row?.total ?? 0;
  });
  const rows = await sequelize.query<WatchRow>(
    `SELECT p.id, p.accession_number, p.title, p.tone_status, p.tone_flags, p.next_check_due,
            p.tone_sparkline, pa.id AS paper_id, pa.name AS paper_name,
            l.id AS location_id, l.code AS location_code
       FROM prints p ${pageIndex}
       LEFT JOIN papers pa ON pa.id = p.paper_id
       LEFT JOIN locations l ON l.id = p.location_id
      WHERE ${sql}
      ORDER BY p.tone_urgency DESC, p.next_check_due ASC, p.id ASC
      LIMIT ${LIMIT}`,
    { type: QueryTypes.SELECT, replacements: values },
  );
  const lines = await sparklinesNotStored(
    rows.filter((row) => row.tone_sparkline === null).map((row) => row.id),
  );
  return { total, items: rows.map((row) => watchItem(row, now, lines)) };
}

function watchItem(row: WatchRow, now: string, lines: Map<number, number[]>): ToneWatchItem {
  const flags = readJson<ToneFlag[]>(row.tone_flags);
  return {
    print: {
      id: row.id,
      accessionNumber: row.accession_number,
      title: row.title,
      paper: row.paper_id !== null ? { id: row.paper_id, name: row.paper_name! } : null,
      location: row.location_id !== null ? { id: row.location_id, code: row.location_code! } : null,
    },
    status: row.tone_status,
    flags,
    reasons: flags.map((flag) => flag.reason),
    nextCheckDue: row.next_check_due,
    overdue: isCheckOverdue(row.next_check_due, now),
    sparkline: row.tone_sparkline
      ? readJson<number[]>(row.tone_sparkline)
      : (lines.get(row.id) ?? []),
  };
}

/**
 * The total reads every matching print's index entry (16 ms at 100,000 prints when every
 * steady print is overdue) while the page is the first 100 of an index walk. The total
 * only moves when data is written or the day turns, so it is kept until either.
 */
const totalsByDatabase = new WeakMap<
  Sequelize,
  Map<string, { generation: number; total: number }>
>();

async function countOnce(
  sequelize: Sequelize,
  key: string,
  count: () => Promise<number>,
): Promise<number> {
  // Taken before counting: a write that commits meanwhile leaves this entry already stale.
  const generation = writeGeneration(sequelize);
  let totals = totalsByDatabase.get(sequelize);
  if (!totals) totalsByDatabase.set(sequelize, (totals = new Map()));
  const known = totals.get(key);
  if (known && known.generation === generation) return known.total;
  const total = await count();
  if (totals.size > 200) totals.clear();
  totals.set(key, { generation, total });
  return total;
}

/** Prints not evaluated since migration 0009 have no stored line: derive it from the checks. */
async function sparklinesNotStored(printIds: number[]): Promise<Map<number, number[]>> {
  if (printIds.length === 0) return new Map();
  const settings = await loadToneSettings();
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
    result.set(printId, evaluatePrintChecks(list, settings).sparkline);
  }
  return result;
}
