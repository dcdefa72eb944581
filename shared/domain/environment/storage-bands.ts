import type { Process } from '../vocabulary';

/**
 * Storage bands for processed photographic prints after ISO 18920 (Imaging materials —
 * Processed photographic reflection prints — Storage practices). We hold no copy of the
 * standard here: every number below is FROM MEMORY of its tables and must be checked
 * against the text before it is relied on.
 *
 * - Medium-term storage (at least 10 years), every print: at most 25 °C, RH 30–50 % (from
 *   memory of ISO 18920's medium-term row).
 * - Extended-term storage, black-and-white silver images: at most 18 °C, RH 30–50 % (from
 *   memory of ISO 18920's extended-term row for silver-gelatin prints).
 * - Short cycles: RH not to swing more than ±5 % within a day, temperature ±2 °C (from
 *   memory of the standard's note on cycling; also common practice).
 *
 * Salt and albumen prints are silver images outside the standard's scope; we give them the
 * silver band (our choice). Cyanotypes and platinum/palladium prints are not silver; we give
 * them the medium-term band for all prints (our choice).
 */
export interface StorageBand {
  key: 'silver-extended' | 'medium-term';
  label: string;
  maxTemperatureC: number;
  minRh: number;
  maxRh: number;
  /** Largest RH change within a day (max − min), percentage points. */
  maxDailyRhSwing: number;
}

export const SILVER_EXTENDED: StorageBand = {
  key: 'silver-extended',
  label: 'Silver images, long-term: ≤ 18 °C, 30–50 % RH',
  maxTemperatureC: 18,
  minRh: 30,
  maxRh: 50,
  maxDailyRhSwing: 10,
};

export const MEDIUM_TERM: StorageBand = {
  key: 'medium-term',
  label: 'All prints, medium-term: ≤ 25 °C, 30–50 % RH',
  maxTemperatureC: 25,
  minRh: 30,
  maxRh: 50,
  maxDailyRhSwing: 10,
};

const SILVER: ReadonlySet<Process> = new Set([
  'salt print',
  'albumen print',
  'hand-coated silver gelatin',
]);

/** The band for the processes a place holds: the strictest of theirs; medium-term when empty. */
export function bandForProcesses(processes: Iterable<string>): StorageBand {
  for (const process of processes) if (SILVER.has(process as Process)) return SILVER_EXTENDED;
  return MEDIUM_TERM;
}

export type BandBreach = 'too-warm' | 'too-damp' | 'too-dry';

/** What is wrong with one reading against a band, or null when it is inside. */
export function bandBreach(band: StorageBand, temperatureC: number, rh: number): BandBreach | null {
  if (rh > band.maxRh) return 'too-damp';
  if (rh < band.minRh) return 'too-dry';
  if (temperatureC > band.maxTemperatureC) return 'too-warm';
  return null;
}

export const BREACH_WORDS: Record<BandBreach, string> = {
  'too-warm': 'warmer than its band',
  'too-damp': 'damper than its band',
  'too-dry': 'drier than its band',
};
