import type { Sequelize } from 'sequelize';
import { summariseDays, type Reading } from '../shared/domain/environment/daily-summary';
import { addDays } from '../shared/domain/tone/dates';
import { writeTransaction } from '../server/db/write-transaction';
import { insertReadings, replaceDays } from '../server/repositories/environment-repository';
import { openExcursionAlerts } from '../server/services/environment/excursion-alerts';
import { placeBand } from '../server/services/environment/place-band';
import { loadPlaceTree } from '../server/services/environment/place-tree';
import { readEnvironmentSettings } from '../server/services/environment/settings';
import { climateReadings, DEMO_CLIMATES, REFERENCE_CLIMATE, yearlyRate } from './demo-climate';
import type { Random } from './random';

/** The demo's last day of readings: the day before its "today" (demo-tone.ts). */
export const DEMO_READINGS_TO = '2026-11-14';
/** Raw rows kept for the last two weeks (the week view); the year before lives in day summaries. */
const RAW_DAYS = 14;
const INTERVAL_MINUTES = 10;

/**
 * A year of 10-minute readings for every demo place with a logger: the day summaries of all
 * of it, the raw rows of its last two weeks, and the alerts those weeks open. About 52,560
 * readings a place are generated and summarised in memory; only ~2,000 rows a place are
 * written, so the demo seed stays quick.
 */
export async function seedDemoEnvironment(
  sequelize: Sequelize,
  placeIds: ReadonlyMap<string, number>,
  rng: Random,
): Promise<number> {
  const to = addDays(DEMO_READINGS_TO, 1);
  const from = addDays(to, -365);
  const rawFrom = addDays(to, -RAW_DAYS);
  const settings = await readEnvironmentSettings();
  const tree = await loadPlaceTree(sequelize);
  let places = 0;
  for (const [code, climate] of Object.entries(DEMO_CLIMATES)) {
    const placeId = placeIds.get(code);
    if (placeId === undefined) continue;
    const all: Reading[] = [...climateReadings(climate, from, to, INTERVAL_MINUTES, rng)];
    const raw = all.filter((r) => r.day >= rawFrom);
    await writeTransaction(sequelize, async (transaction) => {
      await replaceDays(sequelize, placeId, summariseDays(all), transaction);
      await insertReadings(sequelize, placeId, null, raw, transaction);
      const band = await placeBand(sequelize, tree, placeId, transaction);
      const place = tree.byId.get(placeId)!;
      await openExcursionAlerts(sequelize, place, band, raw, settings.excursionHours, transaction);
    });
    places += 1;
  }
  return places;
}

/**
 * How much faster than the reference cabinet a place ages what it holds: the ratio of the
 * yearly rates of its climate (or its nearest ancestor's) and Cabinet 1's. Places with no
 * logger up their chain count as 1.
 */
export function demoPlaceFactors(
  places: ReadonlyArray<{ code: string; parent?: string }>,
): Map<string, number> {
  const reference = yearlyRate(DEMO_CLIMATES[REFERENCE_CLIMATE]!);
  const parents = new Map(places.map((p) => [p.code, p.parent]));
  const factors = new Map<string, number>();
  for (const { code } of places) {
    let current: string | undefined = code;
    while (current && !DEMO_CLIMATES[current]) current = parents.get(current);
    factors.set(code, current ? yearlyRate(DEMO_CLIMATES[current]!) / reference : 1);
  }
  return factors;
}
