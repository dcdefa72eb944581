/**
 * Statements sent at once on one transaction's connection. SQLite still runs them one after
 * another, but the caller waits for the driver once instead of once per statement: inside
 * the write lock each wait was a turn of the event loop behind every other request, paid
 * by every writer queued behind. Only for statements that do not depend on each other.
 *
 * Waits for every one before reporting a failure, so none is still running when the
 * transaction rolls back.
 */
export async function together<A, B>(first: Promise<A>, second: Promise<B>): Promise<[A, B]> {
  const [a, b] = await Promise.allSettled([first, second]);
  if (a.status === 'rejected') throw a.reason;
  if (b.status === 'rejected') throw b.reason;
  return [a.value, b.value];
}
