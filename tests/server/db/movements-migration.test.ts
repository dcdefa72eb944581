import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as movements from '../../../server/db/migrations/0017-movements';
import { buildPrint } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('migration 0017: movements', () => {
  it('gives each print with a place one first movement, dated the day it was recorded', async () => {
    const archivist = await t.as('archivist');
    const box = (await archivist.post('/api/locations').send({ code: 'MIG-1', name: 'Box' })).body
      .id;
    const placed = (await archivist.post('/api/prints').send(buildPrint({ locationId: box }))).body
      .id;
    const unplaced = (await archivist.post('/api/prints').send(buildPrint({ locationId: null })))
      .body.id;
    const qi = t.ctx.sequelize.getQueryInterface();
    // As the table was before the migration ran: no movements at all.
    await movements.down({ context: qi });
    await t.ctx.sequelize.query(`UPDATE prints SET created_at = '2019-04-05 10:11:12.000 +00:00'`);
    await movements.up({ context: qi });
    const rows = await t.ctx.sequelize.query<Record<string, unknown>>(
      'SELECT print_id, from_location_id, to_location_id, moved_on, reason FROM movements',
      { type: QueryTypes.SELECT },
    );
    expect(rows).toEqual([
      {
        print_id: placed,
        from_location_id: null,
        to_location_id: box,
        moved_on: '2019-04-05',
        reason: 'storage',
      },
    ]);
    expect(rows.some((row) => row.print_id === unplaced)).toBe(false);
  });
});
