import type { DaySummary } from '../../shared/domain/environment/daily-summary';
import type {
  DayView,
  EnvironmentAlertView,
  PlaceEnvironment,
} from '../../shared/types/environment';
import type { EnvironmentAlertRow } from '../repositories/environment-alert-repository';
import { date, maybeDate } from '../repositories/decode-columns';
import type { PlaceEnvironmentRecord } from '../services/environment/place-environment';

const round = (value: number, digits: number) => Number(value.toFixed(digits));
const asDate = date().decode;
const asMaybeDate = maybeDate().decode;

function presentDay(d: DaySummary): DayView {
  return {
    day: d.day,
    readings: d.readings,
    temperature: {
      min: round(d.tMin, 2),
      max: round(d.tMax, 2),
      mean: round(d.tSum / d.readings, 2),
    },
    rh: { min: round(d.rhMin, 1), max: round(d.rhMax, 1), mean: round(d.rhSum / d.readings, 1) },
    relativeRate: round(d.rateSum / d.readings, 4),
  };
}

/** A place's alert as conservators see it. */
export function presentEnvironmentAlert(row: EnvironmentAlertRow): EnvironmentAlertView {
  const acknowledgedAt = asMaybeDate(row.acknowledged_at);
  return {
    id: Number(row.id),
    place: { id: Number(row.location_id), code: row.code, name: row.name },
    kind: row.kind,
    reason: row.reason,
    startedAt: asDate(row.started_at).toISOString(),
    endedAt: asDate(row.ended_at).toISOString(),
    openedAt: asDate(row.opened_at).toISOString(),
    acknowledgedAt: acknowledgedAt ? acknowledgedAt.toISOString() : null,
    acknowledgedBy:
      row.acknowledged_by != null && row.acknowledged_email
        ? { id: Number(row.acknowledged_by), email: row.acknowledged_email }
        : null,
  };
}

/**
 * A place's environment. The prints kept there (and so where prints are) only for roles
 * that may see places; alerts only for those who act on them.
 */
export function presentPlaceEnvironment(
  record: PlaceEnvironmentRecord,
  may: { seePlaces: boolean; seeAlerts: boolean },
): PlaceEnvironment {
  return {
    place: record.place,
    source: record.source,
    from: record.from,
    to: record.to,
    band: record.band,
    lifeAtReferenceYears: record.lifeAtReferenceYears,
    days: record.days.map(presentDay),
    readings: record.readings
      ? record.readings.map((r) => ({
          at: new Date(r.at).toISOString(),
          temperatureC: r.temperatureC,
          rh: r.rh,
        }))
      : null,
    figures: record.figures,
    prints: may.seePlaces
      ? {
          count: record.printCount,
          meanRatePerYear: record.meanRatePerYear,
          items: record.prints.map((p) => ({
            id: Number(p.id),
            accessionNumber: p.accession_number,
            title: p.title,
            process: p.process,
            toneStatus: p.tone_status,
            ratePerYear: p.tone_rate_per_year,
          })),
        }
      : null,
    alerts: may.seeAlerts ? record.alerts.map(presentEnvironmentAlert) : [],
  };
}
