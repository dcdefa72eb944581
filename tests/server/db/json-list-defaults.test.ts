import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { up as mendListDefaults } from '../../../server/db/migrations/0021-json-list-defaults';
import { buildPrint } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';
import { testDatabaseDialect } from '../../support/test-database';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

/** The stored JSON text of two list columns, the same on both databases. */
const storedText = async (id: number) => {
  const [row] = await t.ctx.sequelize.query<{ marks: string; tags: string }>(
    'SELECT CAST(marks AS TEXT) AS marks, CAST(tags AS TEXT) AS tags FROM prints WHERE id = ?',
    { replacements: [id], type: QueryTypes.SELECT },
  );
  return row;
};

describe('migration 0021: JSON list columns', () => {
  it('turns rows holding the string "[]" into empty lists', async () => {
    const created = await (await t.as('archivist')).post('/api/prints').send(buildPrint());
    const id = created.body.id as number;
    // As a row written without the columns got them from the old defaults.
    const stringList = testDatabaseDialect() === 'postgres' ? `'"[]"'::json` : `'"[]"'`;
    await t.ctx.sequelize.query(
      `UPDATE prints SET marks = ${stringList}, tags = ${stringList} WHERE id = ?`,
      { replacements: [id] },
    );
    expect(await storedText(id)).toEqual({ marks: '"[]"', tags: '"[]"' });
    await mendListDefaults({ context: t.ctx.sequelize.getQueryInterface() });
    expect(await storedText(id)).toEqual({ marks: '[]', tags: '[]' });
    expect((await (await t.as('curator')).get(`/api/prints/${id}`)).status).toBe(200);
  });

  it.runIf(testDatabaseDialect() === 'postgres')(
    'gives PostgreSQL empty-list defaults',
    async () => {
      const defaults = await t.ctx.sequelize.query<{ column_default: string }>(
        `SELECT DISTINCT column_default FROM information_schema.columns
        WHERE table_schema = current_schema() AND data_type = 'json' AND column_default IS NOT NULL`,
        { type: QueryTypes.SELECT },
      );
      expect(defaults).toEqual([{ column_default: "'[]'::json" }]);
    },
  );
});
