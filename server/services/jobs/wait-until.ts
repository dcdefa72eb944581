import { setTimeout as sleep } from 'node:timers/promises';

/**
 * Resolves once `done` answers true, asking every 25 ms, whichever instance does the work
 * (a job's effect is in the database); fails after `limitMs` saying `still`.
 */
export async function waitUntil(
  done: () => Promise<boolean>,
  still: string,
  limitMs = 60_000,
): Promise<void> {
  for (const until = Date.now() + limitMs; Date.now() < until; await sleep(25)) {
    if (await done()) return;
  }
  throw new Error(`${still} after ${Math.round(limitMs / 1000)} s.`);
}
