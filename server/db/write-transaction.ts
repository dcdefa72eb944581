import { Transaction, type Sequelize } from 'sequelize';

const queues = new WeakMap<Sequelize, Promise<unknown>>();
const generations = new WeakMap<Sequelize, number>();

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
 */
export function writeTransaction<T>(
  sequelize: Sequelize,
  work: (transaction: Transaction) => Promise<T>,
): Promise<T> {
  const previous = queues.get(sequelize) ?? Promise.resolve();
  const run = previous
    .catch(() => undefined)
    .then(() => sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, work))
    .finally(() => generations.set(sequelize, writeGeneration(sequelize) + 1));
  queues.set(
    sequelize,
    run.catch(() => undefined),
  );
  return run;
}
