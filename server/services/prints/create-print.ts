import type { Sequelize, Transaction } from 'sequelize';
import type { PrintCreate } from '../../../shared/schemas/print';
import { writeTransaction } from '../../db/write-transaction';
import { assignAccessionNumbers } from './accession';
import { insertPrints } from './insert-prints';
import type { PrintCommandContext } from './print-command';
import { readPrint } from './read-print';
import { assertLinksExist } from './write-print';

interface Waiting {
  ctx: PrintCommandContext;
  input: PrintCreate;
  settle: { resolve: (id: number) => void; reject: (error: unknown) => void };
}

/** The most creates one transaction takes: it holds the write lock for all of them. */
const MOST_AT_ONCE = 64;
const waiting = new WeakMap<Sequelize, Waiting[]>();

/**
 * Creates a print with its processing history and audit event, through the same insert as
 * an import row, and reads the record back after the commit, outside the lock.
 *
 * Creates that arrive while another write holds the lock wait together and are written in
 * one transaction when the lock comes free (group commit): one BEGIN, one counter update,
 * one multi-row insert per table and one "prints changed" event for all of them, instead of
 * each paying its own. Each still answers only once its print can be found.
 */
export async function createPrint(ctx: PrintCommandContext, input: PrintCreate) {
  const id = await new Promise<number>((resolve, reject) => {
    const queue = waiting.get(ctx.sequelize);
    const entry = { ctx, input, settle: { resolve, reject } };
    if (queue) {
      queue.push(entry);
    } else {
      waiting.set(ctx.sequelize, [entry]);
      void writeWaiting(ctx.sequelize);
    }
  });
  return readPrint(ctx.sequelize, id);
}

/**
 * Writes every create waiting when the lock comes free. If the group fails as a whole (a
 * number typed in by hand taken meanwhile, say), each is tried alone, so one bad create
 * never takes the others with it.
 */
async function writeWaiting(sequelize: Sequelize): Promise<void> {
  let group: Waiting[] | undefined;
  try {
    const ids = await writeTransaction(sequelize, async (transaction) => {
      group = await withLinksChecked(takeGroup(sequelize), transaction);
      return writeGroup(group, transaction);
    });
    group!.forEach((entry, i) => entry.settle.resolve(ids[i]!));
  } catch (error) {
    // Failed before taking its group (the transaction could not start): all of them fail.
    if (!group) for (const entry of takeGroup(sequelize)) entry.settle.reject(error);
    else if (group.length === 1) group[0]!.settle.reject(error);
    else for (const entry of group) writeAlone(entry);
  }
}

/** Takes up to MOST_AT_ONCE waiting creates; any left over start the next group. */
function takeGroup(sequelize: Sequelize): Waiting[] {
  const queue = waiting.get(sequelize) ?? [];
  waiting.delete(sequelize);
  const rest = queue.splice(MOST_AT_ONCE);
  if (rest.length) {
    waiting.set(sequelize, rest);
    void writeWaiting(sequelize);
  }
  return queue;
}

/** Answers 422 to each create that names a record that does not exist; keeps the others. */
async function withLinksChecked(group: Waiting[], transaction: Transaction): Promise<Waiting[]> {
  const kept: Waiting[] = [];
  for (const entry of group) {
    try {
      await assertLinksExist(entry.input, transaction);
      kept.push(entry);
    } catch (error) {
      entry.settle.reject(error);
    }
  }
  return kept;
}

/** Numbers the group's prints in arrival order and inserts them; ids in the group's order. */
async function writeGroup(group: Waiting[], transaction: Transaction): Promise<number[]> {
  if (group.length === 0) return [];
  const sequelize = group[0]!.ctx.sequelize;
  const typed = new Set(group.flatMap(({ input }) => input.accessionNumber ?? []));
  const assigned = await assignAccessionNumbers(
    sequelize,
    new Date().getFullYear(),
    group.filter(({ input }) => input.accessionNumber == null).length,
    transaction,
    typed,
  );
  const numbered = group.map((entry, position) => ({
    ...entry,
    position,
    accessionNumber: entry.input.accessionNumber ?? assigned.shift()!,
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

function writeAlone(entry: Waiting): void {
  writeTransaction(entry.ctx.sequelize, async (transaction) => {
    await assertLinksExist(entry.input, transaction);
    const [id] = await writeGroup([entry], transaction);
    return id!;
  }).then(entry.settle.resolve, entry.settle.reject);
}
