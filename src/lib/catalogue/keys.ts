import { byCodeUnits } from '@shared/domain/sort-keys';
/**
 * Every cache key of a view that shows prints, or anything a print derives (tone state,
 * risk marks, condition, checklists, the start page's counts), lives under `catalogue`.
 * That is what lets one rule (`invalidateCatalogue`) refresh them all after any write that
 * touches a print. Keys of one print's parts sit under `print(id)`, so a prefix reaches them.
 */

/** The list's query as it appears in the address bar (all strings, all optional). */
export type PrintListParams = Readonly<Record<string, string | undefined>>;

/** Keys that are view state, not part of the question asked of the server. */
const VIEW_ONLY = new Set(['view']);

/**
 * The list's parameters as the server reads them: no empty values, no view state, keys in
 * one order, so the Prints list and Search share a cache entry for the same question.
 */
export function normaliseListParams(params: PrintListParams): Record<string, string> {
  const entries = Object.entries(params).filter(
    (entry): entry is [string, string] =>
      entry[1] !== undefined && entry[1] !== '' && !VIEW_ONLY.has(entry[0]),
  );
  return Object.fromEntries(entries.sort(([a], [b]) => byCodeUnits(a, b)));
}

const all = ['catalogue'] as const;
const print = (id: number) => [...all, 'print', id] as const;

export const catalogueKeys = {
  all,
  lists: () => [...all, 'list'] as const,
  list: (params: PrintListParams) => [...all, 'list', normaliseListParams(params)] as const,
  /** The whole collection's facets and minute bands (Search's range histograms). */
  collection: () => [...all, 'collection'] as const,
  prints: () => [...all, 'print'] as const,
  print,
  history: (id: number) => [...print(id), 'history'] as const,
  toneChecks: (id: number) => [...print(id), 'tone-checks'] as const,
  toneTrend: (id: number) => [...print(id), 'tone-trend'] as const,
  conditionReports: (id: number) => [...print(id), 'condition-reports'] as const,
  treatments: (id: number) => [...print(id), 'treatments'] as const,
  movements: (id: number) => [...print(id), 'movements'] as const,
  light: (id: number) => [...print(id), 'light'] as const,
  loans: () => [...all, 'loans'] as const,
  loan: (id: number) => [...all, 'loans', id] as const,
  /** What a place holds on a day (a move changes it). */
  holdings: (placeId: number, on: string) => [...all, 'holdings', placeId, on] as const,
  toneWatch: (params: PrintListParams) =>
    [...all, 'tone-watch', normaliseListParams(params)] as const,
  alerts: () => [...all, 'alerts'] as const,
  round: (from: string, to: string) => [...all, 'tone-round', from, to] as const,
  cohorts: (by: string) => [...all, 'cohorts', by] as const,
  /** A place's readings, figures and its prints' tone rates over a period (issue 17). */
  environment: (placeId: number, from: string, to: string) =>
    [...all, 'environment', placeId, from, to] as const,
  /** Places outside their storage band, open ones first. */
  placeAlerts: () => [...all, 'place-alerts'] as const,
  overview: () => [...all, 'overview'] as const,
  checklists: () => [...all, 'checklists'] as const,
  checklist: (id: number) => [...all, 'checklists', id] as const,
  printingLog: (negativeId: number) => [...all, 'printing-log', negativeId] as const,
  /** A solution batch with the prints made through it and its capacity count. */
  batch: (id: number) => [...all, 'solution-batch', id] as const,
};
