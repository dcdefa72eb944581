import { z } from 'zod';
import './messages';
import { BULK_MOVE_LIMIT, MOVEMENT_REASONS } from '../domain/movements';
import { isoDate, optionalText, pastIsoDate } from './common';

const reason = z.enum(MOVEMENT_REASONS, 'Choose why the prints move');
const toLocationId = z.number('Choose a place').int().positive('Choose a place');

/** `POST /api/prints/:id/movements`: one print to a place. */
export const MovementCreateSchema = z
  .object({ toLocationId, reason, movedOn: pastIsoDate, note: optionalText(500) })
  .strict();
export type MovementCreate = z.infer<typeof MovementCreateSchema>;

/** `POST /api/movements`: many prints to one place, one movement each. */
export const BulkMoveSchema = z
  .object({
    printIds: z
      .array(z.number().int().positive())
      .min(1, 'Pick at least one print')
      .max(BULK_MOVE_LIMIT, `At most ${BULK_MOVE_LIMIT} prints at a time`),
    toLocationId,
    reason,
    movedOn: pastIsoDate,
    note: optionalText(500),
  })
  .strict();
export type BulkMove = z.infer<typeof BulkMoveSchema>;

/** `GET /api/locations/:id/holdings?on=YYYY-MM-DD`: what a place holds, today by default. */
export const HoldingsQuerySchema = z.object({ on: isoDate.optional() }).strict();
export type HoldingsQuery = z.infer<typeof HoldingsQuerySchema>;
