import type { Sequelize } from 'sequelize';
import type { SourceKind } from '../../../shared/domain/registrar/vocabulary';
import { writeTransaction } from '../../db/write-transaction';
import { problems } from '../../middleware/problem';
import type { User } from '../../models';
import { Source } from '../../models';
import { findSource, listSources, printCountsBySource } from '../../repositories/source-repository';
import { recordAudit } from '../audit';

export interface SourceFields {
  name: string;
  kind: SourceKind;
  contact?: string | null;
}

/** A source and how many live prints came from it. */
export interface SourceRecord {
  source: Source;
  prints: number;
}

/** Every source, by name. */
export async function sourceList(sequelize: Sequelize): Promise<SourceRecord[]> {
  const [sources, counts] = await Promise.all([listSources(), printCountsBySource(sequelize)]);
  return sources.map((source) => ({ source, prints: counts.get(source.id) ?? 0 }));
}

/** One source, or 404. */
export async function sourceRecord(sequelize: Sequelize, id: number): Promise<SourceRecord> {
  const source = await findSource(id);
  if (!source) throw problems.notFound('The source');
  const counts = await printCountsBySource(sequelize);
  return { source, prints: counts.get(id) ?? 0 };
}

/** The audit trail keeps the whole source (contact included: the trail is archivist+). */
const snapshot = (source: Source) => ({
  id: source.id,
  name: source.name,
  kind: source.kind,
  contact: source.contact,
});

export async function createSource(
  sequelize: Sequelize,
  user: User,
  input: SourceFields,
): Promise<SourceRecord> {
  const source = await writeTransaction(sequelize, async (transaction) => {
    const created = await Source.create(
      { name: input.name, kind: input.kind, contact: input.contact ?? null },
      { transaction },
    );
    await recordAudit(
      { user, action: 'create', entity: 'source', entityId: created.id, after: snapshot(created) },
      transaction,
    );
    return created;
  });
  return { source, prints: 0 };
}

/**
 * Changes a source. A print's answer reads its source's name afresh and the search index
 * holds only the source's id, so no print needs to be re-read.
 */
export async function updateSource(
  sequelize: Sequelize,
  user: User,
  id: number,
  input: Partial<SourceFields>,
): Promise<SourceRecord> {
  await writeTransaction(sequelize, async (transaction) => {
    const source = await findSource(id, transaction);
    if (!source) throw problems.notFound('The source');
    const before = snapshot(source);
    await source.update(input, { transaction });
    await recordAudit(
      { user, action: 'update', entity: 'source', entityId: id, before, after: snapshot(source) },
      transaction,
    );
  });
  return sourceRecord(sequelize, id);
}
