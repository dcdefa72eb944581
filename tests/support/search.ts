import type { EngineQuery } from '../../server/services/search/engine';

/** A search for these words alone: no filter but live prints, by relevance, the first 10. */
export function wordsQuery(words: string): EngineQuery {
  return {
    words,
    includePlace: false,
    filters: { deleted: false },
    sort: 'relevance',
    offset: 0,
    limit: 10,
    facets: false,
  };
}
