import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Movements: every change of a print's place, kept for ever. The print's `location_id`
 * stays as the place of its latest movement (by date, then by id), so lists, search and
 * the record read it as before. Each print that has a place gets one first movement, dated
 * the day the print was recorded, by whoever recorded it, with the reason "storage".
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('movements', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true, allowNull: false },
    print_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'prints', key: 'id' },
      onDelete: 'CASCADE',
      onUpdate: 'CASCADE',
    },
    from_location_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'locations', key: 'id' },
      onDelete: 'RESTRICT',
      onUpdate: 'CASCADE',
    },
    // Null when an edit cleared the print's place: it went somewhere nobody recorded.
    to_location_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'locations', key: 'id' },
      onDelete: 'RESTRICT',
      onUpdate: 'CASCADE',
    },
    moved_on: { type: DataTypes.DATEONLY, allowNull: false },
    moved_by: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
      onUpdate: 'CASCADE',
    },
    reason: { type: DataTypes.STRING(20), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  // A print's history and its latest movement up to a date.
  await qi.addIndex('movements', ['print_id', 'moved_on', 'id'], {
    name: 'movements_print_on',
  });
  // What a place received up to a date.
  await qi.addIndex('movements', ['to_location_id', 'moved_on'], {
    name: 'movements_to_on',
  });
  const day =
    qi.sequelize.getDialect() === 'postgres'
      ? 'CAST(created_at AS DATE)'
      : 'substr(created_at, 1, 10)';
  await qi.sequelize.query(
    `INSERT INTO movements (print_id, from_location_id, to_location_id, moved_on, moved_by, reason, created_at)
     SELECT id, NULL, location_id, ${day}, created_by, 'storage', created_at
     FROM prints WHERE location_id IS NOT NULL ORDER BY id`,
  );
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('movements');
}
