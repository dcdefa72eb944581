import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { problems } from '../middleware/problem';

/** Bound values per statement; SQLite (3.32+) allows 32,766, PostgreSQL 65,535. */
const MAX_BINDS = 30_000;

/** A date as Sequelize writes DATE columns, so models read it back the same way. */
export function sqlDate(date: Date): string {
  return date.toISOString().replace('T', ' ').replace('Z', ' +00:00');
}

interface SqliteConnection {
  run(sql: string, params: unknown[], callback: (error: Error | null) => void): void;
}

/**
 * Multi-row INSERTs with bound values: the import's hot path, without building a model
 * instance per row. Columns are written as given (snake_case names). On SQLite the
 * values go to the transaction's own connection as positional `?` parameters: SQLite
 * looks named parameters (`$1`, what Sequelize sends) up one by one, which made a
 * 20,000-parameter statement quadratic.
 */
export async function insertMany(
  sequelize: Sequelize,
  table: string,
  columns: readonly string[],
  rows: ReadonlyArray<readonly unknown[]>,
  transaction: Transaction,
): Promise<void> {
  const perStatement = Math.max(1, Math.floor(MAX_BINDS / columns.length));
  const quoted = columns.map((column) => `"${column}"`).join(', ');
  const sqlite = sequelize.getDialect() === 'sqlite';
  for (let start = 0; start < rows.length; start += perStatement) {
    const chunk = rows.slice(start, start + perStatement);
    const values = chunk.flat();
    const tuples = chunk.map((row, index) => {
      const slots = row.map((_value, column) =>
        sqlite ? '?' : `$${index * columns.length + column + 1}`,
      );
      return `(${slots.join(', ')})`;
    });
    const sql = `INSERT INTO "${table}" (${quoted}) VALUES ${tuples.join(', ')}`;
    if (sqlite) await runOnConnection(transaction, sql, values);
    else await sequelize.query(sql, { bind: values, type: QueryTypes.INSERT, transaction });
  }
}

/**
 * One statement with positional `?` values. On SQLite it goes straight to the transaction's
 * connection: for a statement of thousands of values Sequelize would inline every value
 * into the SQL text and then run its statement-kind regexes over that text.
 */
export async function runBound(
  sequelize: Sequelize,
  sql: string,
  values: unknown[],
  transaction: Transaction,
): Promise<void> {
  if (sequelize.getDialect() === 'sqlite') await runOnConnection(transaction, sql, values);
  else await sequelize.query(sql, { replacements: values, transaction });
}

function runOnConnection(transaction: Transaction, sql: string, values: unknown[]): Promise<void> {
  const connection = (transaction as unknown as { connection: SqliteConnection }).connection;
  const bound = values.map((value) => (typeof value === 'boolean' ? Number(value) : value));
  return new Promise((resolve, reject) =>
    connection.run(sql, bound, (error) =>
      error ? reject(asProblem(error, sql, bound)) : resolve(),
    ),
  );
}

/**
 * The driver's UNIQUE failure as the 409 a Sequelize call would have given (the error
 * handler maps Sequelize's own error; this path bypasses Sequelize). For a one-row
 * statement the clashing value is named.
 */
function asProblem(error: Error, sql: string, values: unknown[]): Error {
  const unique = /UNIQUE constraint failed: \w+\.(\w+)/.exec(error.message);
  if (!unique) return error;
  const column = unique[1]!;
  const columns = /\(([^)]*)\) VALUES/
    .exec(sql)?.[1]
    ?.split(', ')
    .map((c) => c.replace(/"/g, ''));
  const index = columns?.indexOf(column) ?? -1;
  const single = columns && values.length === columns.length;
  const value = single && index >= 0 ? String(values[index]) : 'This value';
  const path = column.replace(/_(\w)/g, (_m, letter: string) => letter.toUpperCase());
  return problems.conflict('A record with the same unique value exists.', [
    { path, message: `${value} is already in use` },
  ]);
}
