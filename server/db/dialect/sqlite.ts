import { QueryTypes } from 'sequelize';
import type { SqlDialect } from './index';

/**
 * Everything SQLite-only that Printwarden writes. A PostgreSQL module would answer the same
 * questions: no hints (`''`), `TRUE`, `string_agg`, a `to_char`/`trim_scale` number, `$n`
 * placeholders, ISO dates, no pragmas, `pg_dump` for copies.
 */
export const sqliteDialect: SqlDialect = {
  name: 'sqlite',

  // One file, one writer process.
  severalInstances: false,

  // No ANALYZE statistics are kept, so SQLite takes `deleted_at IS NULL` for a selective
  // equality; the partial indexes over live prints are named outright.
  indexHint: (index) => `INDEXED BY ${index}`,

  true: '1',

  stringAgg: (expression, separator) => `group_concat(${expression}, ${separator})`,

  numberText: (expression) => `printf('%g', ${expression})`,

  // Positional: SQLite looks named parameters (`$1`) up one by one, which made a
  // 20,000-value statement quadratic.
  placeholder: () => '?',

  // Columns take any value; a cast would change how JSON and dates are stored.
  typed: (expression) => expression,

  // Sequelize's own text for DATE columns on SQLite; ISO text reads back as an invalid date.
  dateValue: (date) => date.toISOString().replace('T', ' ').replace('Z', ' +00:00'),

  // BEGIN IMMEDIATE (write-transaction.ts) already holds the database's one write lock.
  async lockForWrite() {},

  // One file, one server process: nobody else to tell.
  async announce() {},

  exclusiveAcrossInstances: (_sequelize, _key, work) => work(),

  async prepare(sequelize, { inMemory }) {
    if (!inMemory) await sequelize.query('PRAGMA journal_mode = WAL;');
    await sequelize.query('PRAGMA synchronous = NORMAL;');
  },

  // WAL: NORMAL loses no committed write when the process dies, and skips a full sync per commit.
  connectionSettings: ['PRAGMA synchronous = NORMAL'],

  async copyInto(sequelize, file) {
    // One read transaction: safe while the server writes.
    await sequelize.query('VACUUM INTO ?', { replacements: [file] });
    await sequelize.query('PRAGMA busy_timeout = 5000');
  },

  async integrityCheck(sequelize) {
    const [row] = await sequelize.query<{ integrity_check: string }>('PRAGMA integrity_check', {
      type: QueryTypes.SELECT,
    });
    return row?.integrity_check ?? 'no answer';
  },
};
