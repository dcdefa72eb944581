/** Why a print changed place (issue 18); the words are the trade's plain ones. */
export const MOVEMENT_REASONS = [
  'storage',
  'study',
  'photography',
  'display',
  'loan',
  'treatment',
  'return',
] as const;
export type MovementReason = (typeof MOVEMENT_REASONS)[number];

/** The reason an edit of a print's place field is recorded under. */
export const EDIT_MOVEMENT_REASON: MovementReason = 'storage';

/** Most prints one bulk move takes (a whole drawer, a shelf of boxes, a large show). */
export const BULK_MOVE_LIMIT = 20_000;

/** A movement as it orders a print's history: by date, then by the order it was recorded. */
export interface OrderedMovement {
  id: number;
  movedOn: string;
}

/** Whether `a` comes after `b` in a print's history (later date, or same date recorded later). */
export function isLaterMovement(a: OrderedMovement, b: OrderedMovement): boolean {
  return a.movedOn > b.movedOn || (a.movedOn === b.movedOn && a.id > b.id);
}
