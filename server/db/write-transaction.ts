import { Transaction, type Sequelize } from 'sequelize';
import { dialectOf } from './dialect';
import { dropNotedChanges, publishNotedChanges, recordNotedChanges } from './prints-changed';

const queues = new WeakMap<Sequelize, Promise<unknown>>();
const generations = new WeakMap<Sequelize, number>();
const publishing = new WeakMap<Sequelize, Promise<void>>();

/**
 * How many write transactions have committed on this database in this process. A read that
 * is costly and changes only with the data may be kept until this number moves.
 */
export function writeGeneration(sequelize: Sequelize): number {
  return generations.get(sequelize) ?? 0;
}

/**
 * Runs `work` in an IMMEDIATE transaction, one writer at a time per process.
 *
 * SQLite allows one writer; a second writer busy-waits inside sqlite3 on a libuv worker
 * thread. With a few of those waiting, the holder of the lock gets no thread to finish
 * on, and every writer times out. Queueing writers here keeps the waiting in JavaScript.
 *
 * Prints noted as changed (`notePrintsChanged`) get one change-feed row in the transaction
 * and, after the commit, one "prints changed" event that every subscriber (the search
 * index) has handled before this resolves: the writer's answer can be read back at once.
 */
export function writeTransaction<T>(
  sequelize: Sequelize,
  work: (transaction: Transaction) => Promise<T>,
): Promise<T> {
  const previous = queues.get(sequelize) ?? Promise.resolve();
  let current: Transaction | undefined;
  const committed = previous
    .catch(() => undefined)
    .then(() =>
      sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
        current = transaction;
        await dialectOf(sequelize).lockForWrite(sequelize, transaction);
        const result = await work(transaction);
        await recordNotedChanges(sequelize, transaction);
        return result;
      }),
    )
    .catch((error: unknown) => {
      if (current) dropNotedChanges(current);
      throw error;
    })
    .finally(() => generations.set(sequelize, writeGeneration(sequelize) + 1));
  // The next writer waits for this commit only; events go out in commit order on a queue
  // of their own, so a slow subscriber delays this writer's answer, not other writers.
  queues.set(
    sequelize,
    committed.catch(() => undefined),
  );
  const published = committed.then(async (result) => {
    const before = publishing.get(sequelize) ?? Promise.resolve();
    const mine = before.then(() => publishNotedChanges(sequelize, current!));
    publishing.set(sequelize, mine);
    await mine;
    return result;
  });
  return published;
}

/**
 * Resolves once every write queued so far has committed (or failed) and its "prints
 * changed" event has reached every subscriber: closing the database before then would
 * leave a subscriber reading from a closed pool.
 */
export async function writesSettled(sequelize: Sequelize): Promise<void> {
  for (;;) {
    const queued = queues.get(sequelize);
    const published = publishing.get(sequelize);
    await Promise.allSettled([queued, published]);
    if (queues.get(sequelize) === queued && publishing.get(sequelize) === published) return;
  }
}
