/** How a print came into the collection, in our own words. */
export const ACQUISITION_METHODS = [
  'gift',
  'purchase',
  'transfer',
  'bequest',
  'made for the collection',
  'found in the collection',
] as const;
export type AcquisitionMethod = (typeof ACQUISITION_METHODS)[number];

/** A source of prints: a person or a body (donor, seller, lender). */
export const SOURCE_KINDS = ['person', 'organisation'] as const;
export type SourceKind = (typeof SOURCE_KINDS)[number];

/** Where on the object a mark sits. */
export const MARK_POSITIONS = ['recto', 'verso', 'mount', 'folder'] as const;
export type MarkPosition = (typeof MARK_POSITIONS)[number];

/** What kind of mark it is. */
export const MARK_KINDS = [
  'pencil inscription',
  'ink signature',
  'blind stamp',
  'ink stamp',
  'label',
] as const;
export type MarkKind = (typeof MARK_KINDS)[number];
