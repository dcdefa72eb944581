import type { Sequelize, Transaction } from 'sequelize';
import type { Reading } from '../../../shared/domain/environment/daily-summary';
import { excursions, type Excursion } from '../../../shared/domain/environment/excursions';
import { BREACH_WORDS, type StorageBand } from '../../../shared/domain/environment/storage-bands';
import {
  insertEnvironmentAlerts,
  overlappingAlertExists,
} from '../../repositories/environment-alert-repository';

const LIMIT_WORDS: Record<Excursion['breach'], (band: StorageBand) => string> = {
  'too-warm': (band) => `at most ${band.maxTemperatureC} °C`,
  'too-damp': (band) => `at most ${band.maxRh} % RH`,
  'too-dry': (band) => `at least ${band.minRh} % RH`,
};

function duration(hours: number): string {
  return hours >= 48 ? `${(hours / 24).toFixed(1)} days` : `${Math.round(hours)} hours`;
}

/** The alert's sentence: which way, how long, from when, how far. */
export function excursionReason(placeName: string, band: StorageBand, e: Excursion): string {
  const worst = e.breach === 'too-warm' ? `${e.worst.toFixed(1)} °C` : `${e.worst.toFixed(0)} % RH`;
  const from = new Date(e.from).toISOString().slice(0, 16).replace('T', ' ');
  return `${placeName} was ${BREACH_WORDS[e.breach]} (${LIMIT_WORDS[e.breach](band)}) for ${duration(e.hours)} from ${from} UTC, reaching ${worst}`;
}

/**
 * Opens an alert for every stretch of these readings outside the band for at least
 * `minHours`, unless one of the same kind already covers it (an upload sent twice, or
 * overlapping files, opens nothing new). Returns how many it opened.
 */
export async function openExcursionAlerts(
  sequelize: Sequelize,
  place: { id: number; name: string },
  band: StorageBand,
  readings: readonly Reading[],
  minHours: number,
  transaction: Transaction,
): Promise<number> {
  const found = excursions(readings, band, minHours);
  const fresh = [];
  for (const e of found) {
    const from = new Date(e.from);
    const to = new Date(e.to);
    if (await overlappingAlertExists(sequelize, place.id, e.breach, from, to, transaction))
      continue;
    fresh.push({
      locationId: place.id,
      kind: e.breach,
      reason: excursionReason(place.name, band, e),
      startedAt: from,
      endedAt: to,
    });
  }
  await insertEnvironmentAlerts(sequelize, fresh, transaction);
  return fresh.length;
}
