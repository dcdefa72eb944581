/**
 * Levenshtein distance (insertions, deletions, substitutions each cost 1), giving up as
 * soon as it must exceed `max`: the search index compares a typed word with thousands of
 * indexed words, and most are far apart, so most comparisons stop after a row or two.
 * Returns `max + 1` when the distance is larger than `max`.
 */
export function boundedEditDistance(a: string, b: string, max: number): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  if (a === b) return 0;
  let previous = new Array<number>(b.length + 1);
  let current = new Array<number>(b.length + 1);
  for (let j = 0; j <= b.length; j += 1) previous[j] = j;
  for (let i = 1; i <= a.length; i += 1) {
    current[0] = i;
    let rowMin = i;
    const ca = a.charCodeAt(i - 1);
    for (let j = 1; j <= b.length; j += 1) {
      const substitute = previous[j - 1]! + (ca === b.charCodeAt(j - 1) ? 0 : 1);
      const value = Math.min(substitute, previous[j]! + 1, current[j - 1]! + 1);
      current[j] = value;
      if (value < rowMin) rowMin = value;
    }
    if (rowMin > max) return max + 1;
    [previous, current] = [current, previous];
  }
  const distance = previous[b.length]!;
  return distance > max ? max + 1 : distance;
}
