import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ToneCheckCreateSchema } from '../../../shared/schemas/tone';
import { ToneCheck } from '../../../server/models';
import { buildPrint } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';
import { buildToneCheck } from '../../support/tone-factories';
import { testDatabaseDialect } from '../../support/test-database';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

type StoredRow = Record<string, unknown>;

async function storedRow(id: number): Promise<StoredRow> {
  const [row] = await t.ctx.sequelize.query<StoredRow>('SELECT * FROM tone_checks WHERE id = ?', {
    replacements: [id],
    type: QueryTypes.SELECT,
  });
  const { id: _id, created_at: createdAt, updated_at: updatedAt, ...rest } = row!;
  // The stamps differ in value, not in form: Sequelize's text on SQLite, timestamps elsewhere.
  if (testDatabaseDialect() === 'sqlite') {
    const stamp = /^\d{4}-\d\d-\d\d \d\d:\d\d:\d\d\.\d{3} \+00:00$/;
    expect(createdAt).toMatch(stamp);
    expect(updatedAt).toMatch(stamp);
  } else {
    expect(createdAt).toBeInstanceOf(Date);
    expect(updatedAt).toBeInstanceOf(Date);
  }
  return rest;
}

/**
 * Logging a check writes the row with one INSERT instead of a model `create`: the stored
 * row must be the one the model would have written, column by column, or reads through
 * the model (edits, the audit trail) would see something else.
 */
describe('a tone check logged through the API', () => {
  it('is stored exactly as the model stores the same check', async () => {
    const archivist = await t.as('archivist');
    const print = await archivist.post('/api/prints').send(buildPrint({ madeOn: '2024-01-10' }));
    const conservator = await t.as('conservator');
    for (const input of [
      buildToneCheck({ baseline: true, notes: 'First reading', instrument: 'Test meter' }),
      buildToneCheck({ checkedOn: '2025-02-03', instrument: undefined, notes: undefined }),
    ]) {
      const logged = await conservator.post(`/api/prints/${print.body.id}/tone-checks`).send(input);
      expect(logged.status).toBe(201);
      const viaModel = await ToneCheck.create({
        ...ToneCheckCreateSchema.parse(input),
        printId: print.body.id as number,
        checkedBy: logged.body.checkedBy.id as number,
      });
      expect(await storedRow(logged.body.id as number)).toEqual(await storedRow(viaModel.id));
      // And the model reads the row back as it was sent.
      const read = await ToneCheck.findByPk(logged.body.id as number);
      expect(read!.readings).toEqual(input.readings);
      expect(read!.baseline).toBe(input.baseline ?? false);
    }
  });
});
