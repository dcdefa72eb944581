import type { Sequelize, Transaction } from 'sequelize';
import { writeTransaction } from './write-transaction';

/** Keeps one item of a group out of the write, answering it with `error`. */
export type Refuse = (index: number, error: unknown) => void;

/**
 * Writes a group of items inside one write transaction and answers each, in the order
 * given (a refused item's answer is not read). It may refuse items before writing anything
 * for them; any other failure rolls back the whole group.
 */
export type WriteGroup<I, R> = (
  items: readonly I[],
  transaction: Transaction,
  refuse: Refuse,
) => Promise<R[]>;

interface Waiting<I, R> {
  item: I;
  resolve: (result: R) => void;
  reject: (error: unknown) => void;
}

/** The most items one transaction takes: it holds the write lock for all of them. */
const MOST_AT_ONCE = 64;

/**
 * Group commit for one kind of write. Items that arrive while another write holds the lock
 * wait together and are written in one transaction when it comes free: one BEGIN and
 * COMMIT, multi-row statements and one "prints changed" event for all of them, instead of
 * each paying its own round trips inside the lock while the others queue behind it. Each
 * caller is answered only after the commit and its event, as `writeTransaction` promises.
 *
 * If the group fails as a whole (a unique number taken meanwhile, say), each item is tried
 * alone, so one bad item never takes the others with it.
 */
export function writeGroups<I, R>(write: WriteGroup<I, R>) {
  const waiting = new WeakMap<Sequelize, Array<Waiting<I, R>>>();

  const take = (sequelize: Sequelize) => {
    const queue = waiting.get(sequelize) ?? [];
    waiting.delete(sequelize);
    const rest = queue.splice(MOST_AT_ONCE);
    if (rest.length) {
      waiting.set(sequelize, rest);
      void writeWaiting(sequelize);
    }
    return queue;
  };

  async function writeWaiting(sequelize: Sequelize): Promise<void> {
    let group: Array<Waiting<I, R>> | undefined;
    const refused = new Map<number, unknown>();
    try {
      const results = await writeTransaction(sequelize, (transaction) => {
        group = take(sequelize);
        return write(
          group.map(({ item }) => item),
          transaction,
          (index, error) => refused.set(index, error),
        );
      });
      group!.forEach((entry, i) =>
        refused.has(i) ? entry.reject(refused.get(i)) : entry.resolve(results[i]!),
      );
    } catch (error) {
      // Failed before taking its group (the transaction could not start): all of them fail.
      if (!group) return take(sequelize).forEach((entry) => entry.reject(error));
      const kept = group.filter((entry, i) => {
        if (refused.has(i)) entry.reject(refused.get(i));
        return !refused.has(i);
      });
      if (kept.length === 1) kept[0]!.reject(error);
      else kept.forEach((entry) => writeAlone(sequelize, entry));
    }
  }

  function writeAlone(sequelize: Sequelize, entry: Waiting<I, R>): void {
    writeTransaction(sequelize, async (transaction) => {
      const [result] = await write([entry.item], transaction, (_index, error) => {
        throw error;
      });
      return result!;
    }).then(entry.resolve, entry.reject);
  }

  /** Queues `item` for the next group on this database; answers with its result. */
  return (sequelize: Sequelize, item: I): Promise<R> =>
    new Promise<R>((resolve, reject) => {
      const queue = waiting.get(sequelize);
      if (queue) return void queue.push({ item, resolve, reject });
      waiting.set(sequelize, [{ item, resolve, reject }]);
      void writeWaiting(sequelize);
    });
}
