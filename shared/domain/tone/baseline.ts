/** The least a check needs to choose the baseline. */
export interface DatedCheck {
  id: number;
  checkedOn: string;
  baseline: boolean;
}

/** Checks in date order (ties by id, the order they were logged). */
export function inDateOrder<T extends DatedCheck>(checks: readonly T[]): T[] {
  return [...checks].sort((x, y) =>
    x.checkedOn === y.checkedOn ? x.id - y.id : x.checkedOn < y.checkedOn ? -1 : 1,
  );
}

/**
 * The baseline is the latest check flagged as one (a new baseline starts a new series;
 * older checks stay readable), else the earliest check. Returns the baseline and the
 * series that starts with it, in date order.
 */
export function currentSeries<T extends DatedCheck>(
  checks: readonly T[],
): { baseline: T; series: T[] } | null {
  const ordered = inDateOrder(checks);
  if (ordered.length === 0) return null;
  let start = 0;
  ordered.forEach((check, index) => {
    if (check.baseline) start = index;
  });
  return { baseline: ordered[start]!, series: ordered.slice(start) };
}
