import type { Sequelize, Transaction } from 'sequelize';
import { dialectOf } from './dialect';
import { selectRows } from './select-rows';

/**
 * What about a print changed: its record as typed, what is derived from it, or a record it
 * shows (a paper, negative, batch or place: `linked`).
 */
export type PrintChangeKind = 'record' | 'derived' | 'tone' | 'deleted' | 'restored' | 'linked';

/** One committed write's change to prints, published after its commit. */
export interface PrintsChanged {
  printIds: number[];
  what: PrintChangeKind[];
}

type Listener = (change: PrintsChanged) => Promise<void> | void;

interface Pending {
  ids: Set<number>;
  what: Set<PrintChangeKind>;
  /** Noted since the last change-feed row (`recordNotedChanges` may run more than once). */
  unrecorded: { ids: Set<number>; what: Set<PrintChangeKind> };
}

const pending = new WeakMap<Transaction, Pending>();
const listeners = new WeakMap<Sequelize, Set<Listener>>();

/**
 * Notes, inside a write transaction, that these prints changed. `writeTransaction` writes
 * one change-feed row before the commit and, once committed, publishes one event to every
 * subscriber (the search index, caches) before the write's caller goes on.
 */
export function notePrintsChanged(
  transaction: Transaction,
  printIds: Iterable<number>,
  what: PrintChangeKind,
): void {
  const entry = pending.get(transaction) ?? {
    ids: new Set(),
    what: new Set(),
    unrecorded: { ids: new Set(), what: new Set() },
  };
  for (const id of printIds) {
    entry.ids.add(id);
    entry.unrecorded.ids.add(id);
  }
  entry.what.add(what);
  entry.unrecorded.what.add(what);
  pending.set(transaction, entry);
}

/** Subscribes to committed print changes on this database; returns the unsubscribe. */
export function onPrintsChanged(sequelize: Sequelize, listener: Listener): () => void {
  const set = listeners.get(sequelize) ?? new Set<Listener>();
  set.add(listener);
  listeners.set(sequelize, set);
  return () => set.delete(listener);
}

/**
 * The change noted on a transaction, if any (ids sorted). A changed paper, negative, batch
 * or place goes out even when no print shows it, so every instance forgets names it kept.
 */
function changeOf(transaction: Transaction, part: 'all' | 'unrecorded'): PrintsChanged | null {
  const noted = pending.get(transaction);
  const entry = part === 'all' ? noted : noted?.unrecorded;
  if (!entry || (entry.ids.size === 0 && !entry.what.has('linked'))) return null;
  return { printIds: [...entry.ids].sort((a, b) => a - b), what: [...entry.what].sort() };
}

/**
 * Before the commit: the change-feed row, in the same transaction as the change.
 * `writeTransaction` calls it last; a writer may call it earlier, to send the row with its
 * own last statements (one wait less inside the write lock). What is noted after that gets a
 * row of its own.
 */
export async function recordNotedChanges(
  sequelize: Sequelize,
  transaction: Transaction,
): Promise<void> {
  const change = changeOf(transaction, 'unrecorded');
  if (!change) return;
  pending.get(transaction)!.unrecorded = { ids: new Set(), what: new Set() };
  const dialect = dialectOf(sequelize);
  const [row] = await selectRows<{ id: number }>(
    sequelize,
    'INSERT INTO print_changes (print_ids, what, at) VALUES (?, ?, ?) RETURNING id',
    [JSON.stringify(change.printIds), JSON.stringify(change.what), dialect.dateValue(new Date())],
    transaction,
  );
  // Other instances on the database read the feed; this one has its change already.
  if (row) own.get(sequelize)?.add(row.id);
  await dialect.announce(sequelize, 'prints', '', transaction);
}

const own = new WeakMap<Sequelize, Set<number>>();

/**
 * Change-feed rows this process wrote (and published itself), kept from the first call
 * (a change follower starting) until the follower passes them.
 */
export function ownChanges(sequelize: Sequelize): Set<number> {
  const set = own.get(sequelize) ?? new Set<number>();
  own.set(sequelize, set);
  return set;
}

/** After the commit: every subscriber has the change before the writer answers. */
export async function publishNotedChanges(
  sequelize: Sequelize,
  transaction: Transaction,
): Promise<void> {
  const change = changeOf(transaction, 'all');
  pending.delete(transaction);
  if (change) await publishChange(sequelize, change);
}

/** Hands one committed change to every subscriber, in turn. */
export async function publishChange(sequelize: Sequelize, change: PrintsChanged): Promise<void> {
  for (const listener of listeners.get(sequelize) ?? []) {
    // The write has committed: a subscriber's failure is logged, never turned into a
    // failed write (the subscriber catches up at its next rebuild).
    try {
      await listener(change);
    } catch (error) {
      console.error('A "prints changed" subscriber failed', error);
    }
  }
}

/** Forgets what a rolled-back transaction noted. */
export function dropNotedChanges(transaction: Transaction): void {
  pending.delete(transaction);
}
