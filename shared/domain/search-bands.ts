/**
 * Minute bands for the fixing and washing range controls and their facet counts. The
 * edges fall on the trade's rules of thumb (common practice: fix at least 10 minutes,
 * wash at least 5 and preferably 10 or more; see processing.ts), so a band never straddles
 * a rule.
 */
export const FIXING_BAND_EDGES = [0, 5, 10, 15, 20, 30] as const;
export const WASHING_BAND_EDGES = [0, 5, 10, 20, 30, 60] as const;

/** The band of a number of minutes: index i covers [edges[i], edges[i + 1]). */
export function bandOf(minutes: number, edges: readonly number[]): number {
  let band = 0;
  while (band + 1 < edges.length && minutes >= edges[band + 1]!) band += 1;
  return band;
}

/**
 * "under 5 min", "10 to under 15 min", "30 min or more": a band holds its lower edge and not
 * its upper one, and "5–10 min" beside "10–15 min" left 10 minutes in both.
 */
export function bandLabel(band: number, edges: readonly number[]): string {
  const from = edges[band]!;
  const to = edges[band + 1];
  if (to === undefined) return `${from} min or more`;
  return from === 0 ? `under ${to} min` : `${from} to under ${to} min`;
}
