/**
 * Edit distance with insertions, deletions, substitutions and swaps of two neighbouring
 * letters each costing 1 (the "optimal string alignment" variant of Damerau–Levenshtein:
 * a swapped pair, the commonest typing slip, is one edit, so "orchrad" finds "orchard").
 * Gives up as soon as the distance must exceed `max`: the index compares a typed word with
 * thousands of words, and most are far apart. Returns `max + 1` when it is larger.
 */
export function boundedEditDistance(a: string, b: string, max: number): number {
  if (Math.abs(a.length - b.length) > max) return max + 1;
  if (a === b) return 0;
  let beforePrevious = new Array<number>(b.length + 1).fill(0);
  let previous = new Array<number>(b.length + 1);
  let current = new Array<number>(b.length + 1);
  for (let j = 0; j <= b.length; j += 1) previous[j] = j;
  for (let i = 1; i <= a.length; i += 1) {
    current[0] = i;
    let rowMin = i;
    const ca = a.charCodeAt(i - 1);
    for (let j = 1; j <= b.length; j += 1) {
      const cb = b.charCodeAt(j - 1);
      let value = Math.min(
        previous[j - 1]! + (ca === cb ? 0 : 1),
        previous[j]! + 1,
        current[j - 1]! + 1,
      );
      if (i > 1 && j > 1 && ca === b.charCodeAt(j - 2) && a.charCodeAt(i - 2) === cb)
        value = Math.min(value, beforePrevious[j - 2]! + 1);
      current[j] = value;
      if (value < rowMin) rowMin = value;
    }
    // A swap reaches back two rows, so stop only when both rows are past the bound.
    if (rowMin > max && Math.min(...previous) > max) return max + 1;
    [beforePrevious, previous, current] = [previous, current, beforePrevious];
  }
  const distance = previous[b.length]!;
  return distance > max ? max + 1 : distance;
}
