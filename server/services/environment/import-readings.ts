import type { Sequelize } from 'sequelize';
import { summariseDays, type Reading } from '../../../shared/domain/environment/daily-summary';
import {
  LoggerFileError,
  loggerIdOf,
  parseLoggerCsv,
  type LoggerMapping,
} from '../../../shared/domain/environment/logger-csv';
import type { ReadingsImportReport } from '../../../shared/types/environment';
import type { ReadingsUpload } from '../../../shared/schemas/environment';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import type { User } from '../../models';
import {
  daysWithSummary,
  findLogger,
  insertReadings,
  readingsOfDay,
  replaceDays,
  saveLogger,
  storedTimes,
} from '../../repositories/environment-repository';
import { recordAudit } from '../audit';
import { openExcursionAlerts } from './excursion-alerts';
import { placeBand } from './place-band';
import { loadPlaceTree } from './place-tree';
import { readEnvironmentSettings } from './settings';

/** The logger's id as its file names it in the lines before the header, if it does. */
const loggerKeyInFile = (text: string) => loggerIdOf(text.slice(0, 4000).split(/\r?\n/, 40));

const iso = (ms: number | undefined) => (ms === undefined ? null : new Date(ms).toISOString());

/**
 * A logger export for one place: read with the logger's remembered mapping and zone (or the
 * ones given, which are then remembered), checked, and — unless a dry run — stored with its
 * day summaries, in one write transaction with its audit event and any alerts it opens.
 * A dry run reads the database but writes nothing, not even the logger's mapping.
 */
export async function importReadings(
  ctx: { sequelize: Sequelize; user: User },
  placeId: number,
  text: string,
  upload: ReadingsUpload,
  dryRun: boolean,
): Promise<ReadingsImportReport> {
  const { sequelize } = ctx;
  const tree = await loadPlaceTree(sequelize);
  const place = tree.byId.get(placeId);
  if (!place) throw problems.notFound('The place');
  const key = upload.loggerId ?? loggerKeyInFile(text);
  const remembered = key ? await findLogger(sequelize, key) : null;
  const mapping: Partial<LoggerMapping> | null = upload.mapping ?? remembered?.mapping ?? null;
  const timeZone = upload.timeZone ?? remembered?.timeZone ?? 'UTC';
  let log;
  try {
    log = parseLoggerCsv(text, { mapping, timeZone });
  } catch (error) {
    if (error instanceof LoggerFileError)
      throw problems.invalid([{ path: 'file', message: error.message }]);
    throw error;
  }
  const first = log.readings[0]?.at;
  const last = log.readings[log.readings.length - 1]?.at;
  const stored =
    first === undefined ? new Set<number>() : await storedTimes(sequelize, placeId, first, last!);
  const fresh = stored.size ? log.readings.filter((r) => !stored.has(r.at)) : log.readings;
  const summaries = summariseDays(fresh);
  const report: ReadingsImportReport = {
    dryRun,
    logger: { key, remembered: remembered !== null },
    mapping: log.mapping,
    timeZone,
    rows: log.rows,
    accepted: fresh.length,
    duplicates: log.duplicates,
    alreadyStored: log.readings.length - fresh.length,
    rejected: log.rejected,
    rejectedCount: log.rejectedCount,
    intervalMinutes: log.intervalMinutes,
    gaps: log.gaps,
    gapCount: log.gapCount,
    from: iso(first),
    to: iso(last),
    days: summaries.length,
    alertsOpened: 0,
  };
  if (dryRun || fresh.length === 0) return report;

  const settings = await readEnvironmentSettings();
  report.alertsOpened = await writeTransaction(sequelize, async (transaction) => {
    const loggerId = key
      ? await saveLogger(
          sequelize,
          { key, mapping: log.mapping, timeZone, locationId: placeId },
          transaction,
        )
      : null;
    await insertReadings(sequelize, placeId, loggerId, fresh, transaction);
    // Days that already had readings are summarised again from everything stored for them.
    const merged = await daysWithSummary(
      sequelize,
      placeId,
      summaries.map((s) => s.day),
      transaction,
    );
    const days = [];
    for (const summary of summaries) {
      if (!merged.has(summary.day)) days.push(summary);
      else
        days.push(
          ...summariseDays(await readingsOfDay(sequelize, placeId, summary.day, transaction)),
        );
    }
    await replaceDays(sequelize, placeId, days, transaction);
    await recordAudit(
      {
        user: ctx.user,
        action: 'create',
        entity: 'environment-readings',
        entityId: placeId,
        after: { logger: key, readings: fresh.length, from: report.from, to: report.to, timeZone },
      },
      transaction,
    );
    const band = await placeBand(sequelize, tree, placeId, transaction);
    return openExcursionAlerts(
      sequelize,
      { id: placeId, name: place.name },
      band,
      fresh as Reading[],
      settings.excursionHours,
      transaction,
    );
  });
  return report;
}
