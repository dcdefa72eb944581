import type { Transaction } from 'sequelize';
import type { PrintCreate } from '../../../shared/schemas/print';
import { writeGroups, type Refuse } from '../../db/write-groups';
import { assignAccessionNumbers } from './accession';
import { insertPrints } from './insert-prints';
import type { PrintCommandContext } from './print-command';
import { readPrint } from './read-print';
import { assertLinksExist } from './write-print';

interface Create {
  ctx: PrintCommandContext;
  input: PrintCreate;
}

/**
 * Creates a print with its processing history and audit event, through the same insert as
 * an import row, and reads the record back after the commit, outside the lock. Creates that
 * arrive together are written in one transaction (`db/write-groups.ts`).
 */
export async function createPrint(ctx: PrintCommandContext, input: PrintCreate) {
  const id = await writeCreate(ctx.sequelize, { ctx, input });
  return readPrint(ctx.sequelize, id);
}

const writeCreate = writeGroups<Create, number>(async (creates, transaction, refuse) => {
  const kept = await withLinksChecked(creates, transaction, refuse);
  const ids = await insertNumbered(kept, transaction);
  const idOf = new Map(kept.map((create, i) => [create, ids[i]!]));
  return creates.map((create) => idOf.get(create) ?? 0);
});

/** Refuses (422) each create that names a record that does not exist; keeps the others. */
async function withLinksChecked(
  creates: readonly Create[],
  transaction: Transaction,
  refuse: Refuse,
): Promise<Create[]> {
  const kept: Create[] = [];
  for (const [index, create] of creates.entries()) {
    try {
      await assertLinksExist(create.input, transaction);
      kept.push(create);
    } catch (error) {
      refuse(index, error);
    }
  }
  return kept;
}

/** Numbers the prints in arrival order and inserts them; ids in the order given. */
async function insertNumbered(creates: Create[], transaction: Transaction): Promise<number[]> {
  if (creates.length === 0) return [];
  const typed = new Set(creates.flatMap(({ input }) => input.accessionNumber ?? []));
  const assigned = await assignAccessionNumbers(
    creates[0]!.ctx.sequelize,
    new Date().getFullYear(),
    creates.filter(({ input }) => input.accessionNumber == null).length,
    transaction,
    typed,
  );
  const numbered = creates.map((create, position) => ({
    ...create,
    position,
    accessionNumber: create.input.accessionNumber ?? assigned.shift()!,
  }));
  // Each print's audit event and creator are its own person's: one insert per person.
  const ids: number[] = [];
  for (const userId of new Set(numbered.map(({ ctx }) => ctx.user.id))) {
    const mine = numbered.filter(({ ctx }) => ctx.user.id === userId);
    const written = await insertPrints(
      mine[0]!.ctx,
      mine.map(({ input, accessionNumber }) => ({
        input,
        accessionNumber,
        source: { from: 'form' },
      })),
      transaction,
    );
    mine.forEach(({ position }, i) => (ids[position] = written[i]!));
  }
  return ids;
}
