import { QueryTypes, type Sequelize } from 'sequelize';

/** The newest change-feed row's id (0 when there is none): one row per write transaction. */
export async function lastFeedId(sequelize: Sequelize): Promise<number> {
  const [row] = await sequelize.query<{ id: number | null }>(
    'SELECT MAX(id) AS id FROM print_changes',
    { type: QueryTypes.SELECT },
  );
  return Number(row?.id ?? 0);
}

/** How many change-feed rows, so write transactions that changed prints, came after `id`. */
export async function feedRowsSince(sequelize: Sequelize, id: number): Promise<number> {
  const [row] = await sequelize.query<{ n: number }>(
    'SELECT COUNT(*) AS n FROM print_changes WHERE id > ?',
    { replacements: [id], type: QueryTypes.SELECT },
  );
  return Number(row!.n);
}
