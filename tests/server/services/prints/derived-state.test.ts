import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp, type App } from '../../../../server/app';
import { PrintSearchIndex } from '../../../../server/services/prints/search-index';
import { buildPrint, buildSaltSteps } from '../../../support/factories';
import { buildCsv, buildCsvRow, importCsv } from '../../../support/imports';
import { buildReadings, buildToneCheck } from '../../../support/tone-factories';
import {
  signIn,
  startTestApp,
  TEST_PASSWORD,
  type SignedIn,
  type TestApp,
} from '../../../support/test-app';

// Derived state (processing-risk reasons) changes on prints nobody edited: every such print
// must be found by `processingRisk=true` in the very next request, and after a restart.
let t: TestApp;
let archivist: SignedIn;
let admin: SignedIn;
const restartedApps: App[] = [];
beforeAll(async () => {
  t = await startTestApp();
  archivist = await t.as('archivist');
  admin = await t.as('admin');
});
afterAll(async () => {
  for (const app of restartedApps) await app.close();
  await t.close();
});

/** A salt print fixed in `batchId`, made on `madeOn`, on one 8×10 in sheet. */
function printWithFixer(batchId: number, madeOn: string, title: string) {
  const processing = buildSaltSteps().map((step) =>
    step.stage === 'fixing' ? { ...step, solutionBatchId: batchId } : step,
  );
  return buildPrint({ title, madeOn, sheetWidthMm: 203.2, sheetHeightMm: 254, processing });
}

async function makePrint(batchId: number, madeOn: string, title: string): Promise<number> {
  const response = await archivist.post('/api/prints').send(printWithFixer(batchId, madeOn, title));
  expect(response.status).toBe(201);
  return response.body.id as number;
}

async function makeFixer(code: string, volumeMl: number): Promise<number> {
  const response = await archivist.post('/api/solution-batches').send({
    code,
    kind: 'fixer',
    chemical: 'sodium thiosulfate',
    concentrationPercent: 15,
    volumeMl,
  });
  expect(response.status).toBe(201);
  return response.body.id as number;
}

const RISKY = '/api/prints?processingRisk=true&pageSize=100';
const idsOf = (body: { items: Array<{ id: number }> }) => body.items.map((item) => item.id);

/** What the record and the search say of these prints, in the next request each. */
async function riskNow(ids: number[], asker: SignedIn = archivist) {
  const searched = idsOf((await asker.get(RISKY)).body);
  const records = await Promise.all(
    ids.map(async (id) => (await asker.get(`/api/prints/${id}`)).body.processingRisk),
  );
  return { records, searched: ids.map((id) => searched.includes(id)) };
}

/**
 * The server as after a restart: a new index from the snapshot file that the running one
 * saved before the change (stamped with the fingerprint of that moment), and an archivist
 * signed in to it.
 */
async function restarted(): Promise<SignedIn> {
  const index = new PrintSearchIndex(t.ctx.sequelize, join(t.dir, 'search-index.bin'));
  const app = createApp({ ...t.ctx, searchIndex: index });
  restartedApps.push(app);
  return signIn(app.app, 'archivist@test.example', TEST_PASSWORD);
}

describe('derived state follows every change, in the next request and after a restart', () => {
  it('lowering the fixer capacity flags the prints now over it', async () => {
    const batch = await makeFixer('FIX-LOW', 100); // 2 sheets at 20 sheets per litre
    const first = await makePrint(batch, '2025-02-01', 'Capacity one');
    const second = await makePrint(batch, '2025-02-02', 'Capacity two');
    expect(await riskNow([first, second])).toEqual({
      records: [false, false],
      searched: [false, false],
    });
    await t.ctx.searchIndex.saveSnapshot();

    // 10 sheets per litre: the 100 ml bath fixes one sheet; the second print is past it.
    const patched = await admin
      .patch('/api/settings')
      .send({ chemistry: { fixerCapacitySheetsPerLitre: 10 } });
    expect(patched.status).toBe(200);
    expect(await riskNow([first, second])).toEqual({
      records: [false, true],
      searched: [false, true],
    });
    expect((await riskNow([first, second], await restarted())).searched).toEqual([false, true]);

    await admin.patch('/api/settings').send({ chemistry: { fixerCapacitySheetsPerLitre: null } });
    expect(await riskNow([second])).toEqual({ records: [false], searched: [false] });
  });

  it('a print made earlier, added to a bath, pushes a later print past its capacity', async () => {
    const batch = await makeFixer('FIX-EARLY', 100);
    const later = await makePrint(batch, '2025-03-02', 'Bath later');
    const latest = await makePrint(batch, '2025-03-03', 'Bath latest');
    expect((await riskNow([later, latest])).searched).toEqual([false, false]);
    await t.ctx.searchIndex.saveSnapshot();

    const earliest = await makePrint(batch, '2025-03-01', 'Bath earliest');

    expect(await riskNow([earliest, later, latest])).toEqual({
      records: [false, false, true],
      searched: [false, false, true],
    });
    expect((await riskNow([latest], await restarted())).searched).toEqual([true]);
  });

  it('marking a batch exhausted flags the prints made after that day', async () => {
    const batch = await makeFixer('FIX-TIRED', 2000);
    const before = await makePrint(batch, '2024-02-20', 'Fixed while fresh');
    const after = await makePrint(batch, '2024-05-14', 'Fixed when tired');
    await t.ctx.searchIndex.saveSnapshot();

    const marked = await archivist
      .patch(`/api/solution-batches/${batch}`)
      .send({ exhaustedOn: '2024-03-01' });
    expect(marked.status).toBe(200);

    expect(await riskNow([before, after])).toEqual({
      records: [false, true],
      searched: [false, true],
    });
    expect((await riskNow([before, after], await restarted())).searched).toEqual([false, true]);
  });
});

describe('tone status and imports reach the index through the noted change', () => {
  it('a tone check that turns a print yellowing is searchable at once and after a restart', async () => {
    const id = await makePrint(await makeFixer('FIX-TONE', 2000), '2024-01-10', 'Toned later');
    const conservator = await t.as('conservator');
    const logged = await conservator
      .post(`/api/prints/${id}/tone-checks`)
      .send(buildToneCheck({ baseline: true }));
    expect(logged.status).toBe(201);
    await t.ctx.searchIndex.saveSnapshot();

    const later = await conservator
      .post(`/api/prints/${id}/tone-checks`)
      .send(buildToneCheck({ checkedOn: '2026-03-02', readings: buildReadings({ dminB: 7.2 }) }));
    expect(later.body.tone.status).toBe('yellowing');
    const yellowing = '/api/prints?toneStatus=yellowing&pageSize=100';
    expect(idsOf((await archivist.get(yellowing)).body)).toContain(id);
    // The status is stored without a new updatedAt: only the change feed tells a restart.
    expect(idsOf((await (await restarted()).get(yellowing)).body)).toContain(id);
  });

  it('imported prints are searchable at once and after a restart', async () => {
    await t.ctx.searchIndex.saveSnapshot();
    const job = await importCsv(
      archivist,
      buildCsv([buildCsvRow(7001, { Title: 'Bladderwort pool' })]),
    );
    expect(job.status).toBe('done');
    expect((await archivist.get('/api/prints?q=bladderwort')).body.total).toBe(1);
    expect((await (await restarted()).get('/api/prints?q=bladderwort')).body.total).toBe(1);
  });
});

describe('read your writes', () => {
  it('finds a print created while the index rebuilds', async () => {
    await makePrint(await makeFixer('FIX-RB', 2000), '2025-04-01', 'Before the rebuild');
    const rebuilding = t.ctx.searchIndex.rebuild();
    const id = await makePrint(await makeFixer('FIX-RB2', 2000), '2025-04-02', 'Quillwort meadow');
    const found = await archivist.get('/api/prints?q=quillwort');
    expect(idsOf(found.body)).toEqual([id]);
    await rebuilding;
    expect(idsOf((await archivist.get('/api/prints?q=quillwort')).body)).toEqual([id]);
  });

  it('finds a print created just after a start, before any search, on a stale snapshot', async () => {
    await t.ctx.searchIndex.saveSnapshot();
    await makePrint(await makeFixer('FIX-ST', 2000), '2025-05-01', 'Makes the snapshot stale');
    const afterStart = await restarted();
    const created = await afterStart
      .post('/api/prints')
      .send(buildPrint({ title: 'Sundew hollow' }));
    expect(created.status).toBe(201);
    const found = await afterStart.get('/api/prints?q=sundew');
    expect(idsOf(found.body)).toEqual([created.body.id]);
  });
});
