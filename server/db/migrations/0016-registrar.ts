import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The registrar's record (issue 19): a list of sources (donors, sellers, lenders) and, on
 * each print, how it came in (its source as a column, so one donor's prints are found
 * together; method, date, reference, credit line and price as one JSON value), earlier
 * owners in order, its rights (the RightsStatements.org URI as a column, for the filter;
 * holder and note as JSON) and its marks and inscriptions in order.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('sources', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    name: { type: DataTypes.STRING(200), allowNull: false },
    kind: { type: DataTypes.STRING(20), allowNull: false },
    contact: DataTypes.TEXT,
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addColumn('prints', 'source_id', {
    type: DataTypes.INTEGER,
    references: { model: 'sources', key: 'id' },
    onDelete: 'RESTRICT',
  });
  await qi.addColumn('prints', 'acquisition', { type: DataTypes.JSON });
  await qi.addColumn('prints', 'provenance', {
    type: DataTypes.JSON,
    allowNull: false,
    defaultValue: '[]',
  });
  await qi.addColumn('prints', 'rights_statement', { type: DataTypes.STRING(80) });
  await qi.addColumn('prints', 'rights', { type: DataTypes.JSON });
  await qi.addColumn('prints', 'marks', {
    type: DataTypes.JSON,
    allowNull: false,
    defaultValue: '[]',
  });
  await qi.addIndex('prints', ['source_id'], { name: 'prints_source_id' });
  await qi.addIndex('prints', ['rights_statement'], { name: 'prints_rights_statement' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeIndex('prints', 'prints_rights_statement');
  await qi.removeIndex('prints', 'prints_source_id');
  for (const column of [
    'marks',
    'rights',
    'rights_statement',
    'provenance',
    'acquisition',
    'source_id',
  ])
    await qi.removeColumn('prints', column);
  await qi.dropTable('sources');
}
