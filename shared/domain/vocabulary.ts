/** Controlled words of the catalogue. Plain trade terms; stored as written here. */

export const PROCESSES = [
  'salt print',
  'albumen print',
  'cyanotype',
  'platinum/palladium print',
  'hand-coated silver gelatin',
] as const;
export type Process = (typeof PROCESSES)[number];

export const PRINT_STATUSES = [
  'in storage',
  'on display',
  'on loan',
  'in treatment',
  'deaccessioned',
] as const;
export type PrintStatus = (typeof PRINT_STATUSES)[number];

export const STAGES = [
  'salting',
  'sensitizing',
  'exposure',
  'prewash',
  'toning',
  'fixing',
  'washing',
  'clearing',
  'drying',
  'other',
] as const;
export type Stage = (typeof STAGES)[number];

/** Wet stages are timed: a record without minutes says nothing about permanence. */
export const STAGES_NEEDING_MINUTES: ReadonlySet<Stage> = new Set([
  'prewash',
  'toning',
  'fixing',
  'washing',
  'clearing',
]);

export const STAGE_LABELS: Record<Stage, string> = {
  salting: 'Salting',
  sensitizing: 'Sensitizing',
  exposure: 'Exposure',
  prewash: 'Pre-wash',
  toning: 'Toning',
  fixing: 'Fixing',
  washing: 'Washing',
  clearing: 'Clearing',
  drying: 'Drying',
  other: 'Other',
};

/** Suggestions for free-text fields; other words are accepted. */
export const METHOD_SUGGESTIONS = [
  'floated',
  'brushed',
  'swabbed',
  'rod-coated',
  'immersed',
  'tray, agitated',
  'running water',
  'air-dried',
  'between blotters',
] as const;

export const LIGHT_SOURCE_SUGGESTIONS = ['open shade', 'direct sun', 'UV unit'] as const;

export const NEGATIVE_KINDS = [
  'glass plate',
  'film',
  'digital negative',
  'paper negative',
] as const;
export type NegativeKind = (typeof NEGATIVE_KINDS)[number];

export const BATCH_KINDS = ['salting', 'sensitiser', 'fixer', 'toner', 'clearing agent'] as const;
export type BatchKind = (typeof BATCH_KINDS)[number];

/** Tone status of a print; `unchecked` until its first tone check. */
export const TONE_STATUSES = [
  'unchecked',
  'steady',
  'watch',
  'fading',
  'darkening',
  'yellowing',
] as const;
export type ToneStatus = (typeof TONE_STATUSES)[number];

/** How a tone check was measured (here, not in the schema, so forms need no zod to list them). */
export const TONE_METHODS = ['spectrophotometer', 'colorimeter', 'scan'] as const;
