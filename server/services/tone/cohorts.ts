import { QueryTypes, type Sequelize } from 'sequelize';
import {
  fixingBand,
  meanWithInterval,
  SMALL_GROUP,
  washingBand,
  type CohortDimension,
} from '../../../shared/domain/tone/cohort-stats';
import type { CohortGroup } from '../../../shared/types/tone';
import { Location } from '../../models';
import { locationPaths } from '../locations/location-paths';
import { LIGHT_BANDS, lightBand } from '../../../shared/domain/light/bands';
import { lifetimeDoses } from '../loans/light';

interface Row {
  id: number;
  fixing_minutes: number | null;
  washing_minutes: number | null;
  paper_id: number | null;
  paper_name: string | null;
  location_id: number | null;
  rate: number | null;
  checks: number;
}

const BAND_ORDER = [
  'none',
  'lt5',
  '5-10',
  '10-20',
  '10-30',
  'ge20',
  'ge30',
  ...LIGHT_BANDS.map((band) => band.key),
];

/**
 * Checked prints grouped by a practice, with the mean tone-change rate (ΔE00 a year, the
 * fastest patch's trend) and its 95 % interval. Batch groups count a print under every
 * solution batch its steps name.
 */
export async function cohorts(sequelize: Sequelize, by: CohortDimension): Promise<CohortGroup[]> {
  const rows = await sequelize.query<Row>(
    `SELECT p.id, p.fixing_minutes, p.washing_minutes, p.paper_id, pa.name AS paper_name,
            p.location_id,
            p.tone_rate_per_year AS rate,
            (SELECT COUNT(*) FROM tone_checks c WHERE c.print_id = p.id) AS checks
       FROM prints p LEFT JOIN papers pa ON pa.id = p.paper_id
      WHERE p.deleted_at IS NULL AND p.tone_status <> 'unchecked'`,
    { type: QueryTypes.SELECT },
  );
  const groups = new Map<string, { label: string; rows: Row[] }>();
  const add = (key: string, label: string, row: Row) => {
    const group = groups.get(key) ?? { label, rows: [] };
    group.rows.push(row);
    groups.set(key, group);
  };
  const batchesOf = by === 'batch' ? await batchesByPrint(sequelize) : new Map();
  const placeNames = by === 'place' ? locationPaths(await Location.findAll()) : new Map();
  const doseOf = by === 'light' ? await lifetimeDoses(sequelize) : new Map<number, number>();
  for (const row of rows) {
    if (by === 'fixing') {
      const band = fixingBand(row.fixing_minutes);
      add(band.key, band.label, row);
    } else if (by === 'washing') {
      const band = washingBand(row.washing_minutes);
      add(band.key, band.label, row);
    } else if (by === 'place') {
      const id = row.location_id;
      add(
        id == null ? 'none' : String(id),
        id == null ? 'No place recorded' : (placeNames.get(id) ?? `Place ${id}`),
        row,
      );
    } else if (by === 'light') {
      const band = lightBand(doseOf.get(row.id) ?? 0);
      add(band.key, band.label, row);
    } else if (by === 'paper') {
      add(String(row.paper_id ?? 'none'), row.paper_name ?? 'No paper recorded', row);
    } else {
      const batches = batchesOf.get(row.id) ?? [{ key: 'none', label: 'No batch recorded' }];
      for (const batch of batches) add(batch.key, batch.label, row);
    }
  }
  const result = [...groups.entries()].map(([key, group]) => {
    const rates = group.rows.flatMap((row) => (row.rate === null ? [] : [row.rate]));
    const stats = meanWithInterval(rates);
    return {
      key,
      label: group.label,
      prints: group.rows.length,
      checks: group.rows.reduce((sum, row) => sum + Number(row.checks), 0),
      meanRatePerYear: stats.mean,
      interval:
        stats.low === null || stats.high === null ? null : { low: stats.low, high: stats.high },
      printsWithTrend: rates.length,
      small: group.rows.length < SMALL_GROUP,
    };
  });
  const rank = (key: string) => (BAND_ORDER.includes(key) ? BAND_ORDER.indexOf(key) : 99);
  return result.sort((x, y) => rank(x.key) - rank(y.key) || x.label.localeCompare(y.label));
}

async function batchesByPrint(
  sequelize: Sequelize,
): Promise<Map<number, Array<{ key: string; label: string }>>> {
  const rows = await sequelize.query<{ print_id: number; id: number; code: string; kind: string }>(
    `SELECT DISTINCT s.print_id, b.id, b.code, b.kind FROM processing_steps s
       JOIN solution_batches b ON b.id = s.solution_batch_id`,
    { type: QueryTypes.SELECT },
  );
  const map = new Map<number, Array<{ key: string; label: string }>>();
  for (const row of rows) {
    const list = map.get(row.print_id) ?? [];
    list.push({ key: String(row.id), label: `${row.code} (${row.kind})` });
    map.set(row.print_id, list);
  }
  return map;
}
