import type { Sequelize } from 'sequelize';
import { dialectOf } from '../../db/dialect';

/** The tail of each original's queue of holders, by SHA-256. */
const tails = new Map<string, Promise<void>>();

/**
 * Runs `work` while no other holder of the same original's lock runs. Storing an upload
 * and deleting the last image of the same file both check-then-act on the shared original
 * (is it stored? does anything still refer to it?); one at a time per file, a delete can
 * never remove what a concurrent upload of the same bytes has just recorded. Holders queue
 * in this process, and the first of the queue also holds the database's lock of that file,
 * so instances sharing a PostgreSQL database (and a bucket) wait for each other too.
 */
export async function withHashLock<T>(
  sequelize: Sequelize,
  sha256: string,
  work: () => Promise<T>,
): Promise<T> {
  const previous = tails.get(sha256) ?? Promise.resolve();
  let release!: () => void;
  const done = new Promise<void>((resolve) => (release = resolve));
  const tail = previous.then(() => done);
  tails.set(sha256, tail);
  await previous;
  try {
    return await dialectOf(sequelize).exclusiveAcrossInstances(
      sequelize,
      `original:${sha256}`,
      work,
    );
  } finally {
    release();
    if (tails.get(sha256) === tail) tails.delete(sha256);
  }
}
