import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { dialectOf } from './dialect';
import { sqliteDialect } from './dialect/sqlite';
import { problems } from '../middleware/problem';
import { runOnConnection, selectOnConnection } from './driver';

/** Bound values per statement; SQLite (3.32+) allows 32,766, PostgreSQL 65,535. */
const MAX_BINDS = 30_000;

/**
 * A date as Sequelize writes DATE columns on SQLite, so models read it back the same way.
 * Prefer `dialectOf(sequelize).dateValue(date)` in new code.
 */
export function sqlDate(date: Date): string {
  return sqliteDialect.dateValue(date);
}

/**
 * Multi-row INSERTs with bound values: the import's hot path, without building a model
 * instance per row. Columns are written as given (snake_case names). On SQLite the values
 * go to the transaction's own connection (`driver.ts`).
 */
export async function insertMany(
  sequelize: Sequelize,
  table: string,
  columns: readonly string[],
  rows: ReadonlyArray<readonly unknown[]>,
  transaction: Transaction,
): Promise<void> {
  for (const { sql, values } of insertStatements(sequelize, table, columns, rows)) {
    if (sequelize.getDialect() === 'sqlite') await runDirect(transaction, sql, values);
    else await sequelize.query(sql, { bind: values, type: QueryTypes.INSERT, transaction });
  }
}

/**
 * `insertMany` that answers the named columns of the rows it wrote (`RETURNING`, SQLite
 * 3.35+ and PostgreSQL), so new ids need no second read. The rows may come in any order.
 */
export async function insertManyReturning<T extends object>(
  sequelize: Sequelize,
  table: string,
  columns: readonly string[],
  rows: ReadonlyArray<readonly unknown[]>,
  returning: readonly string[],
  transaction: Transaction,
): Promise<T[]> {
  const written: T[] = [];
  const tail = ` RETURNING ${returning.map((column) => `"${column}"`).join(', ')}`;
  for (const { sql, values } of insertStatements(sequelize, table, columns, rows)) {
    if (sequelize.getDialect() === 'sqlite') {
      try {
        written.push(...(await selectOnConnection<T>(sequelize, sql + tail, values, transaction)));
      } catch (error) {
        throw asProblem(error as Error, sql, values);
      }
    } else {
      written.push(
        ...(await sequelize.query<T>(sql + tail, {
          bind: values,
          type: QueryTypes.SELECT,
          transaction,
        })),
      );
    }
  }
  return written;
}

/** The multi-row INSERTs for `rows`, each within the bound-value limit. */
function* insertStatements(
  sequelize: Sequelize,
  table: string,
  columns: readonly string[],
  rows: ReadonlyArray<readonly unknown[]>,
): Generator<{ sql: string; values: unknown[] }> {
  const dialect = dialectOf(sequelize);
  const perStatement = Math.max(1, Math.floor(MAX_BINDS / columns.length));
  const quoted = columns.map((column) => `"${column}"`).join(', ');
  for (let start = 0; start < rows.length; start += perStatement) {
    const chunk = rows.slice(start, start + perStatement);
    const tuples = chunk.map((row, index) => {
      const slots = row.map((_value, column) =>
        dialect.placeholder(index * columns.length + column),
      );
      return `(${slots.join(', ')})`;
    });
    yield {
      sql: `INSERT INTO "${table}" (${quoted}) VALUES ${tuples.join(', ')}`,
      values: chunk.flat(),
    };
  }
}

/**
 * One statement with positional `?` values. On SQLite it goes straight to the transaction's
 * connection (`driver.ts`); elsewhere through Sequelize's replacements.
 */
export async function runBound(
  sequelize: Sequelize,
  sql: string,
  values: unknown[],
  transaction: Transaction,
): Promise<void> {
  if (sequelize.getDialect() === 'sqlite') await runDirect(transaction, sql, values);
  else await sequelize.query(sql, { replacements: values, transaction });
}

/** The driver path, with its errors in the shape a Sequelize call would have given. */
async function runDirect(transaction: Transaction, sql: string, values: unknown[]): Promise<void> {
  try {
    await runOnConnection(transaction, sql, values);
  } catch (error) {
    const bound = values.map((value) => (typeof value === 'boolean' ? Number(value) : value));
    throw asProblem(error as Error, sql, bound);
  }
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
