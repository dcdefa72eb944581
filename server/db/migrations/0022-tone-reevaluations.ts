import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * The collection-wide tone re-evaluation's progress, kept in the database so every server
 * instance shows the same run and a stopped run carries on where its last committed range
 * ended. One row (id 1), written at each range's commit.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('tone_reevaluations', {
    id: { type: DataTypes.INTEGER, primaryKey: true, allowNull: false },
    status: { type: DataTypes.STRING(20), allowNull: false },
    done: { type: DataTypes.INTEGER, allowNull: false },
    total: { type: DataTypes.INTEGER, allowNull: false },
    // The last print id whose new state is committed: the next range starts after it.
    after_id: { type: DataTypes.INTEGER, allowNull: false },
    // A settings change came during the run: one more run follows it.
    again: { type: DataTypes.BOOLEAN, allowNull: false },
    // How many runs have started, for the record and the tests.
    runs: { type: DataTypes.INTEGER, allowNull: false },
    started_at: { type: DataTypes.DATE, allowNull: false },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('tone_reevaluations');
}
