import type { LoggerMapping } from '../domain/environment/logger-csv';
import type { PeriodFigures } from '../domain/environment/period-figures';
import type { StorageBand } from '../domain/environment/storage-bands';

/** What a readings upload (or its dry run) found. */
export interface ReadingsImportReport {
  dryRun: boolean;
  logger: { key: string | null; remembered: boolean };
  mapping: LoggerMapping;
  timeZone: string;
  rows: number;
  /** Readings written (or, in a dry run, that would be written). */
  accepted: number;
  duplicates: number;
  alreadyStored: number;
  rejected: Array<{ row: number; reason: string }>;
  rejectedCount: number;
  intervalMinutes: number | null;
  gaps: Array<{ from: string; to: string; minutes: number }>;
  gapCount: number;
  from: string | null;
  to: string | null;
  days: number;
  alertsOpened: number;
}

export interface DayView {
  day: string;
  readings: number;
  temperature: { min: number; max: number; mean: number };
  rh: { min: number; max: number; mean: number };
  /** Mean relative decay rate of the day (1 = 20 °C / 50 % RH). */
  relativeRate: number;
}

export interface PlaceRef {
  id: number;
  code: string;
  name: string;
}

export interface EnvironmentAlertView {
  id: number;
  place: PlaceRef;
  kind: string;
  reason: string;
  startedAt: string;
  endedAt: string;
  openedAt: string;
  acknowledgedAt: string | null;
  acknowledgedBy: { id: number; email: string } | null;
}

/** `GET /api/locations/:id/environment`. */
export interface PlaceEnvironment {
  place: PlaceRef;
  /** Whose readings these are: the place's own, or its nearest ancestor's; null when none. */
  source: (PlaceRef & { inherited: boolean }) | null;
  from: string | null;
  to: string | null;
  band: StorageBand;
  lifeAtReferenceYears: number;
  days: DayView[];
  /** Raw readings, only for periods of 8 days or less (the week view). */
  readings: Array<{ at: string; temperatureC: number; rh: number }> | null;
  figures: PeriodFigures;
  /** The prints kept here and below with their tone-change rates (roles that see places). */
  prints: {
    count: number;
    meanRatePerYear: number | null;
    items: Array<{
      id: number;
      accessionNumber: string;
      title: string;
      process: string;
      toneStatus: string;
      ratePerYear: number | null;
    }>;
  } | null;
  alerts: EnvironmentAlertView[];
}
