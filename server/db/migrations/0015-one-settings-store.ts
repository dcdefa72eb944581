import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

/**
 * One settings store: every area's settings become one row of `settings` per area
 * (`tone`, `schedule`, `chemistry`), each holding only the values someone changed. The
 * chemistry values move out of `chemistry_settings` (which goes), and the tone watch's
 * single `tone-watch` row splits into its two areas. No value is lost; `down` puts them back.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  const sequelize = qi.sequelize;
  const now = new Date().toISOString();
  const chemistryRows = await sequelize.query<{ key: string; value: number }>(
    'SELECT key, value FROM chemistry_settings',
    { type: QueryTypes.SELECT },
  );
  const chemistry = Object.fromEntries(chemistryRows.map((row) => [row.key, Number(row.value)]));
  const [toneRow] = await sequelize.query<{ value: string }>(
    "SELECT value FROM settings WHERE key = 'tone-watch'",
    { type: QueryTypes.SELECT },
  );
  const tone = toneRow ? (parse(toneRow.value) as { tone?: object; schedule?: object }) : {};
  const areas: [string, object | undefined][] = [
    ['tone', tone.tone],
    ['schedule', tone.schedule],
    ['chemistry', chemistryRows.length > 0 ? chemistry : undefined],
  ];
  for (const [key, value] of areas) {
    if (!value || Object.keys(value).length === 0) continue;
    await qi.bulkInsert('settings', [{ key, value: JSON.stringify(value), updated_at: now }]);
  }
  await qi.bulkDelete('settings', { key: 'tone-watch' });
  await qi.dropTable('chemistry_settings');
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  const sequelize = qi.sequelize;
  const now = new Date().toISOString();
  await qi.createTable('chemistry_settings', {
    key: { type: DataTypes.STRING(60), primaryKey: true, allowNull: false },
    value: { type: DataTypes.REAL, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  const rows = await sequelize.query<{ key: string; value: string }>(
    "SELECT key, value FROM settings WHERE key IN ('tone', 'schedule', 'chemistry')",
    { type: QueryTypes.SELECT },
  );
  const byKey = new Map(rows.map((row) => [row.key, parse(row.value) as Record<string, number>]));
  const chemistry = Object.entries(byKey.get('chemistry') ?? {});
  if (chemistry.length > 0) {
    await qi.bulkInsert(
      'chemistry_settings',
      chemistry.map(([key, value]) => ({ key, value, updated_at: now })),
    );
  }
  if (byKey.has('tone') || byKey.has('schedule')) {
    const value = { tone: byKey.get('tone') ?? {}, schedule: byKey.get('schedule') ?? {} };
    await qi.bulkInsert('settings', [
      { key: 'tone-watch', value: JSON.stringify(value), updated_at: now },
    ]);
  }
  await qi.bulkDelete('settings', { key: ['tone', 'schedule', 'chemistry'] });
}

function parse(value: unknown): unknown {
  return typeof value === 'string' ? JSON.parse(value) : value;
}
