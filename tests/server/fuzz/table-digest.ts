import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';

/** Tables a request may write without changing any record: the session store's own rows. */
const IGNORED = new Set(['sessions', 'sqlite_sequence']);

/** SHA-256 over every row of every table (sessions aside), to prove a request changed nothing. */
export async function digestTables(sequelize: Sequelize): Promise<string> {
  const names = (await sequelize.getQueryInterface().showAllTables()).sort();
  const hash = createHash('sha256');
  for (const name of names) {
    if (IGNORED.has(name)) continue;
    const rows = await sequelize.query(`SELECT * FROM "${name}"`, { type: QueryTypes.SELECT });
    // In a fixed order on every database: each row's text, sorted.
    const texts = rows.map((row) => JSON.stringify(row)).sort();
    hash.update(name).update(JSON.stringify(texts));
  }
  return hash.digest('hex');
}
