import { createHash } from 'node:crypto';
import { QueryTypes, type Sequelize } from 'sequelize';

/** Tables a request may write without changing any record: the session store's own rows. */
const IGNORED = new Set(['sessions', 'sqlite_sequence']);

/** SHA-256 over every row of every table (sessions aside), to prove a request changed nothing. */
export async function digestTables(sequelize: Sequelize): Promise<string> {
  const tables = await sequelize.query<{ name: string }>(
    "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name",
    { type: QueryTypes.SELECT },
  );
  const hash = createHash('sha256');
  for (const { name } of tables) {
    if (IGNORED.has(name)) continue;
    const rows = await sequelize.query(`SELECT * FROM "${name}" ORDER BY rowid`, {
      type: QueryTypes.SELECT,
    });
    hash.update(name).update(JSON.stringify(rows));
  }
  return hash.digest('hex');
}
