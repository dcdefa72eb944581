import type { Sequelize } from 'sequelize';
import type { DaySummary } from '../../../shared/domain/environment/daily-summary';
import { periodFigures } from '../../../shared/domain/environment/period-figures';
import {
  bandForProcesses,
  type StorageBand,
} from '../../../shared/domain/environment/storage-bands';
import { meanWithInterval } from '../../../shared/domain/tone/cohort-stats';
import { addDays, daysBetween } from '../../../shared/domain/tone/dates';
import { MAX_PERIOD_DAYS, type EnvironmentQuery } from '../../../shared/schemas/environment';
import { problems } from '../../middleware/problem';
import { findEnvironmentAlerts } from '../../repositories/environment-alert-repository';
import {
  findDays,
  latestDays,
  printsAt,
  readingsBetween,
  type PrintAtPlace,
} from '../../repositories/environment-repository';
import type { EnvironmentAlertRow } from '../../repositories/environment-alert-repository';
import { loadPlaceTree, type PlaceTree } from './place-tree';
import { readEnvironmentSettings } from './settings';

const WEEK_VIEW_DAYS = 8;
const WEEK_VIEW_READINGS = 5000;
const LISTED_PRINTS = 200;

export interface PlaceEnvironmentRecord {
  place: { id: number; code: string; name: string };
  source: { id: number; code: string; name: string; inherited: boolean } | null;
  from: string | null;
  to: string | null;
  band: StorageBand;
  lifeAtReferenceYears: number;
  days: DaySummary[];
  readings: Array<{ at: number; temperatureC: number; rh: number }> | null;
  figures: ReturnType<typeof periodFigures>;
  prints: PrintAtPlace[];
  printCount: number;
  meanRatePerYear: number | null;
  alerts: EnvironmentAlertRow[];
}

/** The place whose readings stand for this one: itself, else its nearest ancestor with any. */
async function readingSource(sequelize: Sequelize, tree: PlaceTree, placeId: number) {
  const chain = tree.chain(placeId);
  const latest = await latestDays(
    sequelize,
    chain.map((p) => p.id),
  );
  const source = chain.find((p) => latest.has(p.id));
  return source ? { place: source, latest: latest.get(source.id)! } : null;
}

/**
 * A place's environment over a period (default: the year up to its latest reading): the
 * day summaries, the period's figures against the band of what it holds, the raw readings
 * when the period is a week or so, its prints' tone-change rates, and its alerts.
 */
export async function placeEnvironment(
  sequelize: Sequelize,
  placeId: number,
  query: EnvironmentQuery,
): Promise<PlaceEnvironmentRecord> {
  const tree = await loadPlaceTree(sequelize);
  const place = tree.byId.get(placeId);
  if (!place) throw problems.notFound('The place');
  const settings = await readEnvironmentSettings();
  const source = await readingSource(sequelize, tree, placeId);
  const to = query.to ?? source?.latest ?? null;
  const from = query.from ?? (to ? addDays(to, -364) : null);
  if (from && to && daysBetween(from, to) + 1 > MAX_PERIOD_DAYS) {
    throw problems.invalid([
      { path: 'from', message: `Ask for at most ${MAX_PERIOD_DAYS} days at a time` },
    ]);
  }
  const prints = await printsAt(sequelize, tree.below(placeId));
  const band = bandForProcesses(new Set(prints.map((p) => p.process)));
  const days = source && from && to ? await findDays(sequelize, source.place.id, from, to) : [];
  const weekView = from && to && daysBetween(from, to) + 1 <= WEEK_VIEW_DAYS;
  const readings =
    source && weekView
      ? (await readingsBetween(sequelize, source.place.id, from, to, WEEK_VIEW_READINGS)).map(
          (r) => ({
            at: r.at,
            temperatureC: r.temperatureC,
            rh: r.rh,
          }),
        )
      : null;
  const rates = prints.flatMap((p) => (p.tone_rate_per_year == null ? [] : [p.tone_rate_per_year]));
  const alerts = source
    ? await findEnvironmentAlerts(sequelize, { locationIds: [source.place.id], limit: 20 })
    : [];
  const ref = (p: { id: number; code: string; name: string }) => ({
    id: p.id,
    code: p.code,
    name: p.name,
  });
  return {
    place: ref(place),
    source: source ? { ...ref(source.place), inherited: source.place.id !== placeId } : null,
    from,
    to,
    band,
    lifeAtReferenceYears: settings.lifeAtReferenceYears,
    days,
    readings,
    figures: periodFigures(days, band, settings.lifeAtReferenceYears),
    prints: prints.slice(0, LISTED_PRINTS),
    printCount: prints.length,
    meanRatePerYear: meanWithInterval(rates).mean,
    alerts,
  };
}
