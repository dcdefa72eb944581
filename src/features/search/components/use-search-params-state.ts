import { useSearchParams } from 'react-router-dom';
import type { SearchParams } from '../api/search-queries';

/** Keys of the contract's search query, plus how results are shown. */
export const SEARCH_KEYS = [
  'q',
  'process',
  'paperId',
  'toneStatus',
  'fixingMinutesMin',
  'fixingMinutesMax',
  'washingMinutesMin',
  'washingMinutesMax',
  'madeFrom',
  'madeTo',
  'processingRisk',
  'rightsStatement',
  'sourceId',
  'sort',
  'page',
] as const;

/** The search's keys read from an address's query (the page and its route loader agree). */
export function searchParamsFrom(searchParams: URLSearchParams): SearchParams {
  const params: SearchParams = {};
  for (const key of SEARCH_KEYS) {
    const value = searchParams.get(key);
    if (value) params[key] = value;
  }
  return params;
}

/**
 * The whole search lives in the address bar, so it can be shared and Back undoes a step.
 * Any change but paging goes back to page 1.
 */
export function useSearchParamsState() {
  const [searchParams, setSearchParams] = useSearchParams();
  const params = searchParamsFrom(searchParams);
  const view = searchParams.get('view') === 'grid' ? 'grid' : 'table';
  const update = (changes: Record<string, string>) => {
    const next = new URLSearchParams(searchParams);
    for (const [key, value] of Object.entries(changes)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    if (!('page' in changes)) next.delete('page');
    setSearchParams(next);
  };
  /** The query string of GET /api/prints for this search (no paging, no view). */
  const queryString = () => {
    const query = new URLSearchParams(params);
    query.delete('page');
    return query.toString();
  };
  return { params, view, update, queryString };
}
