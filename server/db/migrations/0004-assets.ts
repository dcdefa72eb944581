import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const text = (allowNull = true) => ({ type: DataTypes.TEXT, allowNull });
const integer = (allowNull = true) => ({ type: DataTypes.INTEGER, allowNull });

/** Images of prints (originals named by SHA-256, derivatives, capture metadata, fixity). */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('assets', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    print_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'prints', key: 'id' },
      onDelete: 'CASCADE',
      onUpdate: 'CASCADE',
    },
    view: { type: DataTypes.STRING(20), allowNull: false },
    original_name: text(),
    media_type: { type: DataTypes.STRING(40), allowNull: false },
    bytes: integer(false),
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    storage_key: text(false),
    width: integer(false),
    height: integer(false),
    bit_depth: integer(false),
    channels: integer(false),
    has_profile: { type: DataTypes.BOOLEAN, allowNull: false },
    exif: { type: DataTypes.JSON, allowNull: false },
    status: { type: DataTypes.STRING(20), allowNull: false },
    progress: integer(false),
    error: text(),
    last_fixity_at: { type: DataTypes.DATE, allowNull: true },
    last_fixity_result: { type: DataTypes.STRING(20), allowNull: true },
    uploaded_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    ...timestamps,
  });
  await qi.addIndex('assets', ['print_id'], { name: 'assets_print' });
  await qi.addIndex('assets', ['sha256'], { name: 'assets_sha256' });

  await qi.createTable('fixity_checks', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    status: { type: DataTypes.STRING(20), allowNull: false },
    checked: integer(false),
    total: integer(false),
    mismatches: { type: DataTypes.JSON, allowNull: false },
    missing: { type: DataTypes.JSON, allowNull: false },
    started_by: integer(),
    finished_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });

  // The list shows the recto's thumbnail without a join (set when a recto is added).
  await qi.addColumn('prints', 'recto_asset_id', integer());
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('prints', 'recto_asset_id');
  await qi.dropTable('fixity_checks');
  await qi.dropTable('assets');
}
