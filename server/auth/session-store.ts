import connectSessionSequelize from 'connect-session-sequelize';
import session from 'express-session';
import { DataTypes, type Sequelize, type Transaction } from 'sequelize';
import { announceAccountsChanged, onAccountsChanged } from '../db/accounts-changed';

const SequelizeStore = connectSessionSequelize(session.Store);
export type SessionStore = InstanceType<typeof SequelizeStore>;

/** How often an active session's expiry is pushed forward in the database. */
const TOUCH_EVERY_MS = 5 * 60 * 1000;
/** How long a session read from the table answers again without a read. */
const KEEP_READ_MS = 60 * 1000;
/** Sessions kept at most; past that the oldest reads go first. */
const KEEP_AT_MOST = 5000;

/** Every session store's "forget what you read" per database (more than one app in tests). */
const forgetters = new WeakMap<Sequelize, Set<(sid?: string) => void>>();

/**
 * Sessions were deleted behind the store's back (a user's sessions ended in SQL): every
 * store on this database forgets the sessions it read, now and again once `transaction`
 * commits (a request reading in between still saw the rows), in every instance.
 */
export async function forgetReadSessions(
  sequelize: Sequelize,
  transaction?: Transaction | null,
): Promise<void> {
  const forgetAll = () => forgetEverywhere(sequelize);
  forgetAll();
  transaction?.afterCommit(forgetAll);
  await announceAccountsChanged(sequelize, undefined, transaction);
}

declare module 'express-session' {
  interface SessionData {
    passport?: { user?: number };
    /** The role the session was made for; a change gets a new session id. */
    role?: string;
  }
}

/** The store's table with the owner's id beside each session, so they can be ended at once. */
function defineSessionModel(db: Sequelize): void {
  db.define(
    'Session',
    {
      sid: { type: DataTypes.STRING(36), primaryKey: true },
      expires: DataTypes.DATE,
      data: DataTypes.TEXT,
      userId: { type: DataTypes.INTEGER, allowNull: true },
    },
    { tableName: 'sessions' },
  );
}

/** Every store on this database forgets one session it read (or all of them). */
function forgetEverywhere(sequelize: Sequelize, sid?: string): void {
  forgetters.get(sequelize)?.forEach((forget) => forget(sid));
}

/**
 * Sessions in the app's own database, so they survive restarts. express-session "touches"
 * the stored session on every request, which would be a database write per page view;
 * this store writes that touch at most once per five minutes per session. It also reads
 * each session from the table once a minute at most rather than on every request (a model
 * read per request was a tenth of a record's answer): its own writes and deletes replace
 * what it read, and `forgetReadSessions` empties it when sessions end in SQL
 * (`auth/user-sessions.ts`, demo accounts).
 */
export function createSessionStore(db: Sequelize): SessionStore {
  // The table comes from the migrations; the store never syncs it.
  defineSessionModel(db);
  const store = new SequelizeStore({
    db,
    table: 'Session',
    extendDefaultFields: (defaults, data: session.SessionData) => ({
      ...defaults,
      userId: data.passport?.user ?? null,
    }),
  });
  const lastTouched = new Map<string, number>();
  const touch = store.touch.bind(store);
  store.touch = (sid, data, done) => {
    const now = Date.now();
    if (now - (lastTouched.get(sid) ?? 0) < TOUCH_EVERY_MS) return done?.(null);
    lastTouched.set(sid, now);
    touch(sid, data, done);
  };
  // What was read, as JSON text: each request gets its own object to change.
  const read = new Map<string, { json: string; at: number }>();
  // Moves on every change, so a read that began before one is not kept.
  let epoch = 0;
  const forget = (sid?: string) => {
    epoch += 1;
    if (sid === undefined) read.clear();
    else read.delete(sid);
  };
  const stores = forgetters.get(db) ?? new Set<(sid?: string) => void>();
  stores.add(forget);
  forgetters.set(db, stores);
  // Another instance signed a session out or ended a person's sessions.
  onAccountsChanged(db, forget);
  const get = store.get.bind(store);
  store.get = (sid, done) => {
    const kept = read.get(sid);
    if (kept && Date.now() - kept.at < KEEP_READ_MS) {
      return done(null, JSON.parse(kept.json) as session.SessionData);
    }
    const started = epoch;
    get(sid, (error, data) => {
      if (!error && data && epoch === started) {
        if (read.size >= KEEP_AT_MOST) read.delete(read.keys().next().value!);
        read.set(sid, { json: JSON.stringify(data), at: Date.now() });
      }
      done(error, data);
    });
  };
  const set = store.set.bind(store);
  store.set = (sid, data, done) => {
    forgetEverywhere(db, sid);
    set(sid, data, (error?: unknown) => {
      forgetEverywhere(db, sid);
      done?.(error);
    });
  };
  const destroy = store.destroy.bind(store);
  store.destroy = (sid, done) => {
    lastTouched.delete(sid);
    forgetEverywhere(db, sid);
    destroy(sid, (error?: unknown) => {
      forgetEverywhere(db, sid);
      // Signed out here: no other instance may answer for the session from what it read.
      announceAccountsChanged(db, sid).then(
        () => done?.(error),
        (announceError: unknown) => done?.(error ?? announceError),
      );
    });
  };
  return store;
}
