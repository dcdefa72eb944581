import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { notePrintsChanged } from '../../db/prints-changed';

/** Records whose words or rules appear on the prints that point to them. */
export type LinkedKind = 'paper' | 'negative' | 'batch' | 'location';

const LINKED_SQL: Record<LinkedKind, string> = {
  paper: 'SELECT id FROM prints WHERE paper_id = :id',
  negative: 'SELECT id FROM prints WHERE negative_id = :id',
  batch: 'SELECT DISTINCT print_id AS id FROM processing_steps WHERE solution_batch_id = :id',
  // The place and every place inside it: their full names contain its name.
  location: `WITH RECURSIVE tree(id) AS (SELECT :id UNION SELECT l.id FROM locations l
    JOIN tree ON l.parent_id = tree.id) SELECT p.id FROM prints p JOIN tree ON p.location_id = tree.id`,
};

/**
 * Notes, inside the write that changes a paper, negative, solution batch or place, every
 * print that shows it: their search documents (and anything else derived) follow after the
 * commit, through the one "prints changed" event. Call it before a delete, while the links
 * still exist.
 */
export async function noteLinkedPrintsChanged(
  sequelize: Sequelize,
  kind: LinkedKind,
  id: number,
  transaction: Transaction,
): Promise<void> {
  const rows = await sequelize.query<{ id: number }>(LINKED_SQL[kind], {
    type: QueryTypes.SELECT,
    replacements: { id },
    transaction,
  });
  notePrintsChanged(
    transaction,
    rows.map((row) => row.id),
    'linked',
  );
}
