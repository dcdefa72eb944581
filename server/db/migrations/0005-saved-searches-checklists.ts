import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false };
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const owner = {
  type: DataTypes.INTEGER,
  allowNull: false,
  references: { model: 'users', key: 'id' },
  onDelete: 'CASCADE',
  onUpdate: 'CASCADE',
};

/** A user's saved searches (private to them), and named, ordered checklists of prints. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('saved_searches', {
    id,
    user_id: owner,
    name: { type: DataTypes.STRING(120), allowNull: false },
    query: { type: DataTypes.TEXT, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('saved_searches', ['user_id']);
  await qi.createTable('checklists', {
    id,
    created_by: owner,
    name: { type: DataTypes.STRING(120), allowNull: false },
    // Print ids in the checklist's order; a list of a few hundred at most.
    print_ids: { type: DataTypes.JSON, allowNull: false, defaultValue: '[]' },
    ...timestamps,
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('checklists');
  await qi.dropTable('saved_searches');
}
