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
  switch (sort) {
    case 'relevance':
      return (a, b) =>
        scores[a]! > scores[b]! || (scores[a] === scores[b] && printId[a]! > printId[b]!);
    case 'accession':
      return (a, b) => accession[a]! < accession[b]!;
    case '-accession':
      return (a, b) => accession[a]! > accession[b]!;
    case 'madeOn':
      return (a, b) => {
        const x = madeFrom[a]! || Infinity;
        const y = madeFrom[b]! || Infinity;
        return x < y || (x === y && accession[a]! < accession[b]!);
      };
    case '-madeOn':
      return (a, b) => {
        const x = madeTo[a]! || -Infinity;
        const y = madeTo[b]! || -Infinity;
        return x > y || (x === y && accession[a]! > accession[b]!);
      };
    case 'title':
      return (a, b) =>
        title[a]! < title[b]! || (title[a] === title[b] && accession[a]! < accession[b]!);
    case '-title':
      return (a, b) =>
        title[a]! > title[b]! || (title[a] === title[b] && accession[a]! > accession[b]!);
  }
}
