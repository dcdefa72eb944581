import type { Sequelize, Transaction } from 'sequelize';
import { EDIT_MOVEMENT_REASON, type MovementReason } from '../../../shared/domain/movements';
import { todayIso } from '../../../shared/domain/tone/check-date';
import { notePrintsChanged } from '../../db/prints-changed';
import { problems } from '../../middleware/problem';
import type { User } from '../../models';
import { insertAuditEvents } from '../../repositories/audit-repository';
import {
  insertMovements,
  livePrintPlaces,
  placesOn,
  settlePlaces,
} from '../../repositories/movement-repository';
import { locationStore } from '../../repositories/reference-repository';

/** Prints to move to one place, on one day, for one reason. */
export interface MoveRequest {
  printIds: readonly number[];
  toLocationId: number;
  reason: MovementReason;
  movedOn: string;
  note?: string | null;
}

interface MoveContext {
  sequelize: Sequelize;
  user: User;
}

/** How many unknown ids a refusal names before "and N more". */
const NAMED = 5;

/**
 * Moves prints inside the caller's write transaction: one movement each (from the place it
 * had on that day), one audit event each, each print's place settled to its latest movement,
 * and the prints noted as changed so the search index follows after the commit.
 */
export async function movePrints(
  ctx: MoveContext,
  request: MoveRequest,
  transaction: Transaction,
): Promise<number> {
  const { toLocationId, reason, movedOn } = request;
  if (!(await locationStore.find(toLocationId, transaction))) {
    throw problems.invalid([{ path: 'toLocationId', message: `No place with id ${toLocationId}` }]);
  }
  const ids = [...new Set(request.printIds)];
  const live = await livePrintPlaces(ctx.sequelize, ids, transaction);
  const unknown = ids.filter((id) => !live.has(id));
  if (unknown.length) {
    const named = unknown.slice(0, NAMED).join(', ');
    const more = unknown.length > NAMED ? ` and ${unknown.length - NAMED} more` : '';
    throw problems.invalid([{ path: 'printIds', message: `No print with id ${named}${more}` }]);
  }
  const before = await placesOn(ctx.sequelize, ids, movedOn, transaction);
  await insertMovements(
    ctx.sequelize,
    ids.map((printId) => ({
      printId,
      fromLocationId: before.get(printId) ?? null,
      toLocationId,
      movedOn,
      movedBy: ctx.user.id,
      reason,
      note: request.note ?? null,
    })),
    transaction,
  );
  await settlePlaces(ctx.sequelize, ids, transaction);
  const at = new Date();
  await insertAuditEvents(
    ctx.sequelize,
    ids.map((printId) => ({
      at,
      userId: ctx.user.id,
      action: 'update',
      entity: 'print',
      entityId: printId,
      before: { locationId: live.get(printId) ?? null },
      after: { locationId: toLocationId, movement: { movedOn, reason } },
    })),
    transaction,
  );
  notePrintsChanged(transaction, ids, 'record');
  return ids.length;
}

/**
 * The movement an edit of the place field makes, or a new print's first place: dated
 * today, from the print's place before. The caller writes the print's own audit event.
 */
export async function recordPlaceChange(
  ctx: MoveContext,
  change: { printId: number; from: number | null; to: number | null; movedOn: string },
  reason: MovementReason,
  transaction: Transaction,
): Promise<void> {
  await insertMovements(
    ctx.sequelize,
    [
      {
        printId: change.printId,
        fromLocationId: change.from,
        toLocationId: change.to,
        movedOn: change.movedOn,
        movedBy: ctx.user.id,
        reason,
        note: null,
      },
    ],
    transaction,
  );
  await settlePlaces(ctx.sequelize, [change.printId], transaction);
}

/** An edit of a print's place field becomes a movement dated today (reason: storage). */
export async function followPlaceEdit(
  ctx: MoveContext,
  printId: number,
  before: number | null,
  after: number | null | undefined,
  transaction: Transaction,
): Promise<void> {
  if (after === undefined || after === before) return;
  await recordPlaceChange(
    ctx,
    { printId, from: before, to: after, movedOn: todayIso() },
    EDIT_MOVEMENT_REASON,
    transaction,
  );
}

/** New prints' first movements, to the place they were catalogued in, dated today. */
export async function recordFirstPlaces(
  ctx: MoveContext,
  prints: ReadonlyArray<{ printId: number; locationId: number | null | undefined }>,
  transaction: Transaction,
): Promise<void> {
  const placed = prints.filter((print) => typeof print.locationId === 'number');
  if (placed.length === 0) return;
  const movedOn = todayIso();
  await insertMovements(
    ctx.sequelize,
    placed.map((print) => ({
      printId: print.printId,
      fromLocationId: null,
      toLocationId: print.locationId!,
      movedOn,
      movedBy: ctx.user.id,
      reason: EDIT_MOVEMENT_REASON,
      note: null,
    })),
    transaction,
  );
}
