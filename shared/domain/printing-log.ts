import type { ToneStatus } from './vocabulary';

/** One print from a negative, as the printing log needs it. */
export interface LoggedPrint {
  paperId: number | null;
  lightSource: string | null;
  exposureMinutes: number | null;
  toneStatus: ToneStatus;
}

/** A starting exposure drawn from past prints, never a measurement. */
export interface ExposureSuggestion {
  minutes: number;
  low: number;
  high: number;
  /** How many past prints it rests on. */
  basedOn: number;
  /** 'same' when prints on this paper under this light exist; else the light alone. */
  match: 'same' | 'light only';
  /** The outcome the prints it rests on had. */
  outcome: ToneStatus;
}

/**
 * Better outcomes first: a print still steady is the best known exposure; one not yet
 * checked says nothing against it; watch and the changing states come last.
 */
const OUTCOME_RANK: Record<ToneStatus, number> = {
  steady: 0,
  unchecked: 1,
  watch: 2,
  fading: 3,
  darkening: 3,
  yellowing: 3,
};

/** Light sources are free text: compare them without case or extra spaces. */
export function sameLight(a: string | null, b: string | null): boolean {
  const norm = (value: string | null) => (value ?? '').trim().toLowerCase().replace(/\s+/g, ' ');
  return norm(a) !== '' && norm(a) === norm(b);
}

/**
 * A suggested exposure for a paper and light source from a negative's past prints: the
 * median minutes of the prints with the best outcome, on the same paper and light when
 * there are any, else under the same light on any paper. Null when nothing fits.
 */
export function suggestExposure(
  log: readonly LoggedPrint[],
  wanted: { paperId: number | null; lightSource: string },
): ExposureSuggestion | null {
  const timed = log.filter(
    (print): print is LoggedPrint & { exposureMinutes: number } =>
      print.exposureMinutes != null && sameLight(print.lightSource, wanted.lightSource),
  );
  const samePaper = timed.filter((print) => print.paperId === wanted.paperId);
  const pool = samePaper.length > 0 ? samePaper : timed;
  if (pool.length === 0) return null;
  const bestRank = Math.min(...pool.map((print) => OUTCOME_RANK[print.toneStatus]));
  const best = pool.filter((print) => OUTCOME_RANK[print.toneStatus] === bestRank);
  const minutes = best.map((print) => print.exposureMinutes).sort((a, b) => a - b);
  return {
    minutes: median(minutes),
    low: minutes[0]!,
    high: minutes[minutes.length - 1]!,
    basedOn: minutes.length,
    match: samePaper.length > 0 ? 'same' : 'light only',
    outcome: best[0]!.toneStatus,
  };
}

/** The middle value of sorted numbers (mean of the two middle ones for an even count). */
export function median(sorted: readonly number[]): number {
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
}
