/**
 * Statements sent at once on one transaction's connection. SQLite still runs them one after
 * another, but the caller waits for the driver once instead of once per statement: inside
 * the write lock each wait was a turn of the event loop behind every other request, paid
 * by every writer queued behind. Only for statements that do not depend on each other.
 *
 * Waits for every one before reporting a failure, so none is still running when the
 * transaction rolls back.
 */
export async function together<T extends unknown[]>(
  ...statements: { [K in keyof T]: Promise<T[K]> }
): Promise<T> {
  const settled = await Promise.allSettled(statements);
  const failed = settled.find((result) => result.status === 'rejected');
  if (failed) throw failed.reason;
  return settled.map((result) => (result as PromiseFulfilledResult<unknown>).value) as T;
}
