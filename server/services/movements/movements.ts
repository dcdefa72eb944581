import type { Sequelize } from 'sequelize';
import { todayIso } from '../../../shared/domain/tone/check-date';
import type { BulkMove, MovementCreate } from '../../../shared/schemas/movement';
import type { BulkMoveResult, Holdings, Movement } from '../../../shared/types/movement';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import type { User } from '../../models';
import { findHoldingsOn, findMovementsOfPrint } from '../../repositories/movement-repository';
import { locationStore } from '../../repositories/reference-repository';
import { assertPrintExists } from '../prints/assert-print-exists';
import { movePrints } from './move-prints';

interface Ctx {
  sequelize: Sequelize;
}

/** A print's movements, latest first; 404 for an unknown print. */
export async function movementsOfPrint(ctx: Ctx, printId: number): Promise<Movement[]> {
  await assertPrintExists(printId);
  return findMovementsOfPrint(ctx.sequelize, printId);
}

/** Moves one print; answers with the movement written. */
export async function movePrint(
  ctx: Ctx & { user: User },
  printId: number,
  input: MovementCreate,
): Promise<Movement> {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    await assertPrintExists(printId, transaction);
    await movePrints(ctx, { ...input, printIds: [printId] }, transaction);
    const history = await findMovementsOfPrint(ctx.sequelize, printId, transaction);
    // The newest record, which is not the latest in the history when dated back.
    return history.reduce((newest, movement) => (movement.id > newest.id ? movement : newest));
  });
}

/** Many prints to one place in one transaction, one movement and audit event each. */
export async function bulkMove(
  ctx: Ctx & { user: User },
  input: BulkMove,
): Promise<BulkMoveResult> {
  const moved = await writeTransaction(ctx.sequelize, (transaction) =>
    movePrints(ctx, input, transaction),
  );
  const place = (await locationStore.find(input.toLocationId))!;
  return {
    moved,
    movedOn: input.movedOn,
    to: { id: place.id, code: place.code, name: place.name },
  };
}

/** What a place holds at the end of a day (today by default). */
export async function holdingsOf(ctx: Ctx, locationId: number, on?: string): Promise<Holdings> {
  const place = await locationStore.find(locationId);
  if (!place) throw problems.notFound('The place');
  const day = on ?? todayIso();
  return {
    place: { id: place.id, code: place.code, name: place.name },
    on: day,
    items: await findHoldingsOn(ctx.sequelize, locationId, day),
  };
}
