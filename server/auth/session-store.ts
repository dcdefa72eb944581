import connectSessionSequelize from 'connect-session-sequelize';
import session from 'express-session';
import { DataTypes, type Sequelize } from 'sequelize';

const SequelizeStore = connectSessionSequelize(session.Store);
export type SessionStore = InstanceType<typeof SequelizeStore>;

/** How often an active session's expiry is pushed forward in the database. */
const TOUCH_EVERY_MS = 5 * 60 * 1000;

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

/**
 * Sessions in the app's own database, so they survive restarts. express-session "touches"
 * the stored session on every request, which would be a database write per page view;
 * this store writes that touch at most once per five minutes per session.
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
  const destroy = store.destroy.bind(store);
  store.destroy = (sid, done) => {
    lastTouched.delete(sid);
    destroy(sid, done);
  };
  return store;
}
