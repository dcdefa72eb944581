/** Two-sided 95 % Student t quantiles for 1–30 degrees of freedom (any statistics table). */
const T95 = [
  12.706, 4.303, 3.182, 2.776, 2.571, 2.447, 2.365, 2.306, 2.262, 2.228, 2.201, 2.179, 2.16, 2.145,
  2.131, 2.12, 2.11, 2.101, 2.093, 2.086, 2.08, 2.074, 2.069, 2.064, 2.06, 2.056, 2.052, 2.048,
  2.045, 2.042,
];

/** The t quantile for a 95 % interval; 1.96 (the normal value) beyond 30 degrees of freedom. */
export function t95(degreesOfFreedom: number): number {
  return T95[degreesOfFreedom - 1] ?? 1.96;
}

export interface MeanWithInterval {
  n: number;
  mean: number | null;
  /** 95 % confidence interval of the mean (Student t); null with fewer than 2 values. */
  low: number | null;
  high: number | null;
}

/** The mean of a group and the 95 % interval that says how uncertain it is. */
export function meanWithInterval(values: readonly number[]): MeanWithInterval {
  const n = values.length;
  if (n === 0) return { n, mean: null, low: null, high: null };
  const mean = values.reduce((s, v) => s + v, 0) / n;
  if (n < 2) return { n, mean, low: null, high: null };
  const variance = values.reduce((s, v) => s + (v - mean) ** 2, 0) / (n - 1);
  const half = t95(n - 1) * Math.sqrt(variance / n);
  return { n, mean, low: mean - half, high: mean + half };
}

/** Fewer prints than this in a group and its mean means little. */
export const SMALL_GROUP = 5;

export type CohortDimension = 'fixing' | 'washing' | 'paper' | 'batch' | 'place' | 'light';

/** Fixing-time bands around the 10-minute rule of thumb (common practice). */
export function fixingBand(minutes: number | null): { key: string; label: string } {
  if (minutes === null) return { key: 'none', label: 'No fixing recorded' };
  if (minutes < 5) return { key: 'lt5', label: 'Fixed under 5 min' };
  if (minutes < 10) return { key: '5-10', label: 'Fixed 5–10 min' };
  if (minutes < 20) return { key: '10-20', label: 'Fixed 10–20 min' };
  return { key: 'ge20', label: 'Fixed 20 min or more' };
}

/** Washing-time bands around the 5- and 10-minute rules of thumb (common practice). */
export function washingBand(minutes: number | null): { key: string; label: string } {
  if (minutes === null) return { key: 'none', label: 'No washing recorded' };
  if (minutes < 5) return { key: 'lt5', label: 'Washed under 5 min' };
  if (minutes < 10) return { key: '5-10', label: 'Washed 5–10 min' };
  if (minutes < 30) return { key: '10-30', label: 'Washed 10–30 min' };
  return { key: 'ge30', label: 'Washed 30 min or more' };
}
