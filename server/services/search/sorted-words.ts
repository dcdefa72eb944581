/** Past this many words added since the last sort, a prefix walk merges them in first. */
const MERGE_AFTER = 512;

/**
 * Words kept sorted for prefix walks: a binary search finds where a prefix's words begin,
 * and they follow one another. New words wait in a short unsorted list that a walk also
 * reads, and are merged in (one linear pass) once there are enough of them, so adding a
 * word costs nothing and a walk never sorts the whole list again.
 */
export class SortedWords {
  private words: string[] = [];
  private ids: number[] = [];
  private pendingWords: string[] = [];
  private pendingIds: number[] = [];

  add(word: string, id: number): void {
    this.pendingWords.push(word);
    this.pendingIds.push(id);
  }

  /** Pushes onto `into` the ids of the words that start with `prefix`, in word order. */
  withPrefix(prefix: string, into: number[]): void {
    if (this.pendingWords.length > MERGE_AFTER) this.merge();
    const { words, ids } = this;
    let low = 0;
    let high = words.length;
    while (low < high) {
      const middle = (low + high) >> 1;
      if (words[middle]! < prefix) low = middle + 1;
      else high = middle;
    }
    for (let i = low; i < words.length && words[i]!.startsWith(prefix); i += 1) into.push(ids[i]!);
    this.pendingWords.forEach((word, i) => {
      if (word.startsWith(prefix)) into.push(this.pendingIds[i]!);
    });
  }

  /** Sorts the words added since the last merge into the list (a build calls it at its end). */
  merge(): void {
    if (!this.pendingWords.length) return;
    const order = this.pendingWords.map((_, i) => i);
    const pending = this.pendingWords;
    order.sort((a, b) => (pending[a]! < pending[b]! ? -1 : pending[a]! > pending[b]! ? 1 : 0));
    const words: string[] = [];
    const ids: number[] = [];
    let i = 0;
    let j = 0;
    while (i < this.words.length || j < order.length) {
      if (j === order.length || (i < this.words.length && this.words[i]! <= pending[order[j]!]!)) {
        words.push(this.words[i]!);
        ids.push(this.ids[i]!);
        i += 1;
      } else {
        words.push(pending[order[j]!]!);
        ids.push(this.pendingIds[order[j]!]!);
        j += 1;
      }
    }
    this.words = words;
    this.ids = ids;
    this.pendingWords = [];
    this.pendingIds = [];
  }
}
