import type { PrintQuery } from '../../shared/schemas/print';

export type QueryClass = 'plain' | 'prefix' | 'typo' | 'wordsFilters' | 'filtersOnly' | 'broad';

export interface BenchQuery {
  class: QueryClass;
  /** The query string of GET /api/prints. */
  query: string;
}

/** The 20 queries, in the classes the issue names; words come from the corpus's lists. */
export const QUERIES: BenchQuery[] = [
  { class: 'plain', query: 'q=weir' },
  { class: 'plain', query: 'q=orchard+lane' },
  { class: 'plain', query: 'q=swabbed+gold' },
  { class: 'plain', query: 'q=chapel+frost' },
  { class: 'prefix', query: 'q=orch' },
  { class: 'prefix', query: 'q=sluice+gat' },
  { class: 'prefix', query: 'q=allotm' },
  { class: 'typo', query: 'q=orchrad' },
  { class: 'typo', query: 'q=thiosulfte+swabed' },
  { class: 'typo', query: 'q=alotment+shed' },
  { class: 'wordsFilters', query: 'q=cotton+rag&fixingMinutesMin=10' },
  { class: 'wordsFilters', query: 'q=mill&fixingMinutesMin=10&washingMinutesMin=5' },
  { class: 'wordsFilters', query: 'q=pond&paperId=1&madeTo=2020-01-01' },
  { class: 'wordsFilters', query: 'q=brushed&washingMinutesMax=5' },
  { class: 'filtersOnly', query: 'paperId=1&fixingMinutesMin=10' },
  { class: 'filtersOnly', query: 'washingMinutesMax=5' },
  { class: 'filtersOnly', query: 'process=cyanotype&processingRisk=true&sort=madeOn' },
  { class: 'broad', query: 'q=river' },
  { class: 'broad', query: 'q=gold' },
  { class: 'broad', query: 'q=rod' },
];

/** The query string as the schema's input (what the route would parse). */
export const paramsOf = (query: string): Record<string, string> =>
  Object.fromEntries(new URLSearchParams(query));

export type { PrintQuery };
