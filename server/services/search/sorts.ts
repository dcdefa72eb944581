import { dateRangeMiddle, naturalSortKey } from '../../../shared/domain/sort-keys';
import type { Columns } from './columns';

export type EngineSort =
  'relevance' | 'accession' | '-accession' | 'madeOn' | '-madeOn' | 'title' | '-title';

/**
 * "Does slot a come before slot b" for each order, matching the SQL orders of the list:
 * dates with unknown ones last, ties broken by accession number; relevance by score, then
 * the newer print first.
 */
export function comparatorOf(
  sort: EngineSort,
  columns: Columns,
  scores: Float32Array,
): (a: number, b: number) => boolean {
  const accession = columns.accessionNumber;
  const title = columns.title;
  const { madeFrom, madeTo, printId } = columns.numeric;
  // Keys worked out once per slot and per query, only for the slots compared.
  const titleKeys: string[] = [];
  const titleKey = (slot: number) => (titleKeys[slot] ??= naturalSortKey(title[slot]!));
  const middles: number[] = [];
  const middle = (slot: number) =>
    (middles[slot] ??= dateRangeMiddle(madeFrom[slot]!, madeTo[slot]!));
  switch (sort) {
    case 'relevance':
      return (a, b) =>
        scores[a]! > scores[b]! || (scores[a] === scores[b] && printId[a]! > printId[b]!);
    case 'accession':
      return (a, b) => accession[a]! < accession[b]!;
    case '-accession':
      return (a, b) => accession[a]! > accession[b]!;
    // Approximate dates by the middle of their range; undated prints last either way.
    case 'madeOn':
      return (a, b) => {
        const x = middle(a);
        const y = middle(b);
        const xx = Number.isNaN(x) ? Infinity : x;
        const yy = Number.isNaN(y) ? Infinity : y;
        return xx < yy || (xx === yy && accession[a]! < accession[b]!);
      };
    case '-madeOn':
      return (a, b) => {
        const x = middle(a);
        const y = middle(b);
        const xx = Number.isNaN(x) ? -Infinity : x;
        const yy = Number.isNaN(y) ? -Infinity : y;
        return xx > yy || (xx === yy && accession[a]! > accession[b]!);
      };
    // Numbers inside titles as numbers: "print 2" before "print 10".
    case 'title':
      return (a, b) => {
        const x = titleKey(a);
        const y = titleKey(b);
        return x < y || (x === y && accession[a]! < accession[b]!);
      };
    case '-title':
      return (a, b) => {
        const x = titleKey(a);
        const y = titleKey(b);
        return x > y || (x === y && accession[a]! > accession[b]!);
      };
  }
}
