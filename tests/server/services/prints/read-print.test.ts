import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES } from '../../../../shared/domain/roles';
import { presentPrint } from '../../../../server/presenters/print';
import { PRINT_FIELDS } from '../../../../server/repositories/print-record-repository';
import { loadPrint } from '../../../../server/services/prints/load-print';
import { readPrint } from '../../../../server/services/prints/read-print';
import { buildPrint, buildSaltSteps } from '../../../support/factories';
import { buildJpeg } from '../../../support/images';
import { startTestApp, type SignedIn, type TestApp } from '../../../support/test-app';
import { buildToneCheck } from '../../../support/tone-factories';

// The record read in plain SQL (readPrint) answers byte for byte what the record read
// through Sequelize's includes (loadPrint) answered, for every role and every kind of print.
let t: TestApp;
let archivist: SignedIn;
const ids: Record<string, number> = {};

beforeAll(async () => {
  t = await startTestApp();
  archivist = await t.as('archivist');
  const ok = <T extends { status: number; body: { id: number } }>(response: T) => {
    expect(response.status, JSON.stringify(response.body)).toBeLessThan(300);
    return response.body.id;
  };
  const paperId = ok(await archivist.post('/api/papers').send({ name: 'Cotton rag 300' }));
  const negativeId = ok(
    await archivist.post('/api/negatives').send({ code: 'N-7', kind: 'film', format: '4x5' }),
  );
  const room = ok(await archivist.post('/api/locations').send({ code: 'R1', name: 'Store room' }));
  const cabinet = ok(
    await archivist.post('/api/locations').send({ code: 'R1-C', name: 'Cabinet', parentId: room }),
  );
  const drawer = ok(
    await archivist
      .post('/api/locations')
      .send({ code: 'R1-C-3', name: 'Drawer 3', parentId: cabinet }),
  );
  const batchId = ok(
    await archivist.post('/api/solution-batches').send({
      code: 'FIX-1',
      kind: 'fixer',
      chemical: 'sodium thiosulfate',
      exhaustedOn: '2026-01-10',
    }),
  );
  ids.bare = ok(
    await archivist
      .post('/api/prints')
      .send({ title: 'Bare', process: 'salt print', processing: [] }),
  );
  ids.full = ok(
    await archivist.post('/api/prints').send(
      buildPrint({
        title: 'Weir at dusk',
        paperId,
        negativeId,
        locationId: drawer,
        edition: '2/5',
        processing: buildSaltSteps({ fixing: 1 }).map((step) =>
          step.stage === 'fixing' ? { ...step, solutionBatchId: batchId } : step,
        ),
      }),
    ),
  );
  const assetIds: number[] = [];
  // Two photographs (the same file twice on one print is refused).
  for (const [view, red] of [
    ['recto', 120],
    ['verso', 180],
  ] as const) {
    const uploaded = await archivist
      .post(`/api/prints/${ids.full}/assets`)
      .field('view', view)
      .attach('file', await buildJpeg(64, 48, [red, 90, 60]), `${view}.jpg`);
    expect(uploaded.status).toBe(201);
    assetIds.push(uploaded.body.id);
  }
  // The registrar's record: a source (joined), a price, a chain and a private mark on an image.
  const sourceId = ok(
    await archivist
      .post('/api/sources')
      .send({ name: 'Ada Fenwick', kind: 'person', contact: 'ada@fenwick.test' }),
  );
  const registrar = await archivist.patch(`/api/prints/${ids.full}`).send({
    acquisition: {
      method: 'bequest',
      sourceId,
      acquiredOn: 'c. 2019',
      creditLine: 'Bequest of Ada Fenwick',
      price: 12.5,
    },
    provenance: [{ owner: 'The maker', from: '1990s', to: '2010' }, { owner: 'Ada Fenwick' }],
    rights: { statement: 'http://rightsstatements.org/vocab/InC-EDU/1.0/', holder: 'The maker' },
    marks: [
      {
        position: 'verso',
        kind: 'pencil inscription',
        transcription: 'weir, 2/5',
        assetId: assetIds[1],
        area: { x: 0.1, y: 0.1, width: 0.3, height: 0.2 },
      },
      { position: 'mount', kind: 'label', transcription: 'valued 40', private: true },
    ],
  });
  expect(registrar.status, JSON.stringify(registrar.body)).toBe(200);
  const conservator = await t.as('conservator');
  for (const checkedOn of ['2026-05-20', '2026-06-20']) {
    const check = await conservator
      .post(`/api/prints/${ids.full}/tone-checks`)
      .send(buildToneCheck({ checkedOn }));
    expect(check.status).toBe(201);
  }
  ids.deleted = ok(await archivist.post('/api/prints').send(buildPrint({ title: 'Gone' })));
  expect((await archivist.delete(`/api/prints/${ids.deleted}`)).status).toBe(204);
});
afterAll(() => t.close());

describe('readPrint', () => {
  it('answers every role exactly as the model read did', async () => {
    for (const name of ['bare', 'full']) {
      const model = await loadPrint(ids[name]!);
      const record = await readPrint(t.ctx.sequelize, ids[name]!);
      expect(record.locationPath).toBe(model.locationPath);
      for (const role of ROLES) {
        expect(JSON.stringify(presentPrint(record.print, role, record.locationPath))).toBe(
          JSON.stringify(presentPrint(model.print, role, model.locationPath)),
        );
      }
    }
    // The fixture covers what could decode wrongly: links, a nested place, batches, images,
    // JSON columns, booleans and dates that are set.
    const { print, locationPath } = await readPrint(t.ctx.sequelize, ids.full!);
    expect(locationPath).toBe('Store room › Cabinet › Drawer 3');
    expect(print.assets).toHaveLength(2);
    expect(print.processing.find((step) => step.stage === 'fixing')?.solutionBatch?.code).toBe(
      'FIX-1',
    );
    expect(print.hasProcessingRisk).toBe(true);
    expect(print.toneStatus).not.toBe('unchecked');
    expect(print.source?.name).toBe('Ada Fenwick');
    expect(print.acquisition?.price).toBe(12.5);
    expect(print.marks).toHaveLength(2);
    expect(print.rightsStatement).toBe('http://rightsstatements.org/vocab/InC-EDU/1.0/');
  });

  it('decodes every column of the print as the model does', async () => {
    for (const name of ['bare', 'full']) {
      const model = (await loadPrint(ids[name]!)).print.get({ plain: true }) as Record<
        string,
        unknown
      >;
      const record = (await readPrint(t.ctx.sequelize, ids[name]!)).print as Record<
        string,
        unknown
      >;
      for (const field of Object.keys(PRINT_FIELDS)) {
        expect(record[field], field).toEqual(model[field]);
      }
    }
  });

  it('finds a deleted print only when asked, and answers 404 otherwise', async () => {
    await expect(readPrint(t.ctx.sequelize, ids.deleted!)).rejects.toMatchObject({ status: 404 });
    const model = await loadPrint(ids.deleted!, { includeDeleted: true });
    const record = await readPrint(t.ctx.sequelize, ids.deleted!, { includeDeleted: true });
    expect(record.print.deletedAt).toBeInstanceOf(Date);
    expect(JSON.stringify(presentPrint(record.print, 'admin', record.locationPath))).toBe(
      JSON.stringify(presentPrint(model.print, 'admin', model.locationPath)),
    );
    await expect(readPrint(t.ctx.sequelize, 999_999)).rejects.toMatchObject({ status: 404 });
  });

  it('reads inside a write transaction through that transaction', async () => {
    const { writeTransaction } = await import('../../../../server/db/write-transaction');
    const title = await writeTransaction(t.ctx.sequelize, async (transaction) => {
      await t.ctx.sequelize.query('UPDATE prints SET title = ? WHERE id = ?', {
        replacements: ['Renamed inside', ids.bare],
        transaction,
      });
      return (await readPrint(t.ctx.sequelize, ids.bare!, { transaction })).print.title;
    });
    expect(title).toBe('Renamed inside');
  });
});
