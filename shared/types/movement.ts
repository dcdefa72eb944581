import type { MovementReason } from '../domain/movements';

/** A place as a movement names it. */
export interface MovementPlace {
  id: number;
  code: string;
  name: string;
}

/** One change of a print's place (contract: `{ id, from, to, movedOn, movedBy, reason }`). */
export interface Movement {
  id: number;
  printId: number;
  from: MovementPlace | null;
  /** Null when an edit cleared the print's place. */
  to: MovementPlace | null;
  movedOn: string;
  movedBy: { id: number; name: string } | null;
  reason: MovementReason;
  note: string | null;
}

/** What a bulk move did. */
export interface BulkMoveResult {
  moved: number;
  movedOn: string;
  to: MovementPlace;
}

/** A print a place holds on a date. */
export interface Holding {
  id: number;
  accessionNumber: string;
  title: string;
  process: string;
  since: string;
}

/** `GET /api/locations/:id/holdings`. */
export interface Holdings {
  place: MovementPlace;
  on: string;
  items: Holding[];
}
