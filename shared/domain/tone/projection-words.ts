import { daysBetween, YEAR_DAYS } from './dates';

export interface ProjectionInput {
  /** ΔE00 against the baseline at the latest check. */
  latestDE00: number;
  /** Where the fitted line reaches the noticeable threshold; null when it never rises to it. */
  projectedOn: string | null;
  /** Whether a trend was fitted at all (3 checks or more). */
  hasTrend: boolean;
  noticeableDE00: number;
  /** The horizon of the projection (the `projectionYears` setting). */
  horizonYears: number;
  today: string;
}

/**
 * What a patch's projection says in words: "already noticeable" once the measured ΔE00 has
 * reached the threshold (a date in the past would mislead), "not within N years" beyond the
 * horizon or when the line does not rise, else "noticeable by DATE". Null without a trend.
 */
export function projectionWords(input: ProjectionInput): string | null {
  if (input.latestDE00 >= input.noticeableDE00) return 'already noticeable';
  if (!input.hasTrend) return null;
  const beyond = `not noticeable within ${input.horizonYears} ${input.horizonYears === 1 ? 'year' : 'years'}`;
  if (!input.projectedOn) return beyond;
  if (input.projectedOn <= input.today)
    return `noticeable by now on its trend (${input.projectedOn})`;
  const years = daysBetween(input.today, input.projectedOn) / YEAR_DAYS;
  return years > input.horizonYears ? beyond : `noticeable by ${input.projectedOn}`;
}
