import type { SortingState } from '@tanstack/react-table';
import type { PrintSort } from '@shared/schemas/print';

/** Table column ids and the server's sort names, both ways. */
const COLUMN_SORTS: Record<string, Exclude<PrintSort, 'relevance'>> = {
  accessionNumber: 'accession',
  title: 'title',
  madeOn: 'madeOn',
};

export function sortingFromParam(sort: string | undefined, hasWords: boolean): SortingState {
  const effective = sort ?? (hasWords ? 'relevance' : '-accession');
  const desc = effective.startsWith('-');
  const name = desc ? effective.slice(1) : effective;
  const id = Object.keys(COLUMN_SORTS).find((key) => COLUMN_SORTS[key] === name);
  return id ? [{ id, desc }] : [];
}

export function paramFromSorting(sorting: SortingState): string | undefined {
  const first = sorting[0];
  const name = first ? COLUMN_SORTS[first.id] : undefined;
  if (!first || !name) return undefined;
  return first.desc ? `-${name}` : name;
}
