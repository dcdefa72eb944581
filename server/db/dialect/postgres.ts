import type { SqlDialect } from './index';

/** An arbitrary number naming Printwarden's write lock among the database's advisory locks. */
const WRITE_LOCK_KEY = 7_146_501;

/** The first key of locks named by text (`exclusiveAcrossInstances`). */
const KEYED_LOCKS = 7146;

/** The NOTIFY channels every instance's change follower listens on. */
export const CHANNELS = {
  prints: 'printwarden_print_changes',
  accounts: 'printwarden_accounts',
} as const;

/**
 * What PostgreSQL needs where SQLite's SQL differs. Its planner keeps statistics, so it
 * needs no index hints; copies and checks are the server's own tools (`pg_dump`,
 * `pg_amcheck`), not the app's.
 */
export const postgresDialect: SqlDialect = {
  name: 'postgres',

  severalInstances: true,

  indexHint: () => '',

  true: 'TRUE',

  stringAgg: (expression, separator) => `string_agg((${expression})::text, ${separator})`,

  // `trim_scale` drops the trailing zeros numeric keeps ("15.000" → "15"), as `%g` does.
  numberText: (expression) => `trim_scale((${expression})::numeric)::text`,

  placeholder: (index) => `$${index + 1}`,

  typed: (expression, type) =>
    `CAST(${expression} AS ${type === 'real' ? 'double precision' : type})`,

  // The text Sequelize itself sends for DATE (timestamptz) columns; PostgreSQL parses it.
  dateValue: (date) => date.toISOString().replace('T', ' ').replace('Z', ' +00:00'),

  // One transaction-scoped advisory lock for all writers of every instance; released by
  // COMMIT or ROLLBACK, so a crashed instance cannot leave it held.
  async lockForWrite(sequelize, transaction) {
    await sequelize.query(`SELECT pg_advisory_xact_lock(${WRITE_LOCK_KEY})`, { transaction });
  },

  // Delivered by PostgreSQL at COMMIT, never for a rollback (db/change-follower.ts listens).
  async announce(sequelize, topic, payload, transaction) {
    await sequelize.query('SELECT pg_notify(?, ?)', {
      replacements: [CHANNELS[topic], payload],
      transaction: transaction ?? undefined,
    });
  },

  // A transaction held open only for its advisory lock (two-key form: its own key space,
  // apart from the write lock's); the work runs on other connections meanwhile.
  exclusiveAcrossInstances: (sequelize, key, work) =>
    sequelize.transaction(async (transaction) => {
      await sequelize.query('SELECT pg_advisory_xact_lock(?, hashtext(?))', {
        replacements: [KEYED_LOCKS, key],
        transaction,
      });
      return work();
    }),

  async prepare() {},

  connectionSettings: [],

  async copyInto() {
    throw new Error('Backups of a PostgreSQL database are made with pg_dump, not by the app.');
  },

  async integrityCheck() {
    throw new Error('PostgreSQL is checked with its own tools (pg_amcheck), not by the app.');
  },
};
