import type { Sequelize, Transaction } from 'sequelize';
import { dialectOf } from './dialect';

/** Forgets what was kept about people and sessions: one session, or (no id) everything. */
type Listener = (sessionId?: string) => void;

const listeners = new WeakMap<Sequelize, Set<Listener>>();

/**
 * What every instance keeps about people and sessions (the signed-in users' rows, sessions
 * read in the last minute) must be dropped everywhere when a role changes, a person is
 * deactivated or signs out. Each keeper subscribes here; a change is published to this
 * process at once and announced to the other instances on the database (their change
 * followers publish it there).
 */
export function onAccountsChanged(sequelize: Sequelize, listener: Listener): void {
  const set = listeners.get(sequelize) ?? new Set<Listener>();
  set.add(listener);
  listeners.set(sequelize, set);
}

/** Tells this process's keepers only (the follower's delivery of another's announcement). */
export function publishAccountsChanged(sequelize: Sequelize, sessionId?: string): void {
  listeners.get(sequelize)?.forEach((listener) => listener(sessionId));
}

/** Tells the other instances, at the commit of `transaction` when one is given. */
export async function announceAccountsChanged(
  sequelize: Sequelize,
  sessionId?: string,
  transaction?: Transaction | null,
): Promise<void> {
  await dialectOf(sequelize).announce(sequelize, 'accounts', sessionId ?? '', transaction);
}
