import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { selectOnConnection } from './driver';

/**
 * One SELECT with positional `?` values, rows as plain objects keyed by the column names or
 * aliases of the statement. On SQLite it goes straight to the connection (`driver.ts`: no
 * per-statement stack trace, regexes or parsers); elsewhere through Sequelize's
 * replacements. Values come back as the database stores them: a repository decodes them
 * (`repositories/decode-columns.ts`).
 */
export function selectRows<T extends object>(
  sequelize: Sequelize,
  sql: string,
  values: readonly unknown[],
  transaction?: Transaction | null,
): Promise<T[]> {
  if (sequelize.getDialect() === 'sqlite') {
    return selectOnConnection<T>(sequelize, sql, values, transaction);
  }
  return sequelize.query<T>(sql, {
    replacements: [...values],
    type: QueryTypes.SELECT,
    transaction: transaction ?? undefined,
  });
}
