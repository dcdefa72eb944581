import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Chemistry settings (fixer capacity, sensitiser coverage) as key → number rows, and the
 * indexes the batch page and the printing log read by.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('chemistry_settings', {
    key: { type: DataTypes.STRING(60), primaryKey: true, allowNull: false },
    value: { type: DataTypes.REAL, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('processing_steps', ['solution_batch_id']);
  await qi.addIndex('prints', ['negative_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeIndex('prints', ['negative_id']);
  await qi.removeIndex('processing_steps', ['solution_batch_id']);
  await qi.dropTable('chemistry_settings');
}
