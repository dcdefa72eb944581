import connectSessionSequelize from 'connect-session-sequelize';
import session from 'express-session';
import type { Sequelize } from 'sequelize';

const SequelizeStore = connectSessionSequelize(session.Store);
export type SessionStore = InstanceType<typeof SequelizeStore>;

/** How often an active session's expiry is pushed forward in the database. */
const TOUCH_EVERY_MS = 5 * 60 * 1000;

/**
 * Sessions in the app's own database, so they survive restarts. express-session "touches"
 * the stored session on every request, which would be a database write per page view;
 * this store writes that touch at most once per five minutes per session.
 */
export function createSessionStore(db: Sequelize): SessionStore {
  // The table comes from the migrations; the store never syncs it.
  const store = new SequelizeStore({ db, tableName: 'sessions' });
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
