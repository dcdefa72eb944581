import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint, buildSaltSteps } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

/** A salt print fixed 12 min in `batchId`, made on `madeOn`, on an 8×10 in sheet. */
function printWithFixer(batchId: number, madeOn: string, title = 'Fixer test') {
  const steps = buildSaltSteps().map((step) =>
    step.stage === 'fixing' ? { ...step, solutionBatchId: batchId } : step,
  );
  return buildPrint({
    title,
    madeOn,
    sheetWidthMm: 203.2,
    sheetHeightMm: 254,
    processing: steps,
  });
}

async function createBatch(body: Record<string, unknown>): Promise<number> {
  const response = await (await t.as('archivist')).post('/api/solution-batches').send(body);
  expect(response.status).toBe(201);
  return response.body.id as number;
}

const codes = (body: { riskReasons: Array<{ code: string }> }) =>
  body.riskReasons.map((reason) => reason.code);

describe('fixer batch rules', () => {
  it('advises, without a processing concern, when the fixer was mixed after the print was made; a corrected mixing date clears it', async () => {
    const archivist = await t.as('archivist');
    const batchId = await createBatch({
      code: 'FIX-LATE',
      kind: 'fixer',
      chemical: 'sodium thiosulfate',
      concentrationPercent: 15,
      volumeMl: 2000,
      madeOn: '2025-04-12',
    });
    const old = await archivist.post('/api/prints').send(printWithFixer(batchId, '2023-04-20'));
    expect(old.status).toBe(201);
    expect(codes(old.body)).toEqual(['fixer-mixed-after-print']);
    expect(old.body.processingRisk).toBe(false);
    expect(old.body.riskReasons[0].message).toContain('mixed on 2025-04-12');

    await archivist.patch(`/api/solution-batches/${batchId}`).send({ madeOn: '2023-04-01' });
    const after = await archivist.get(`/api/prints/${old.body.id}`);
    expect(codes(after.body)).toEqual([]);
  });

  it('flags a print made after its fixer was marked exhausted, and follows the batch record', async () => {
    const archivist = await t.as('archivist');
    const batchId = await createBatch({
      code: 'FIX-EX',
      kind: 'fixer',
      chemical: 'sodium thiosulfate',
      concentrationPercent: 15,
      volumeMl: 2000,
      exhaustedOn: '2024-03-01',
    });
    const late = await archivist.post('/api/prints').send(printWithFixer(batchId, '2024-05-14'));
    expect(late.status).toBe(201);
    expect(codes(late.body)).toEqual(['exhausted-fixer']);
    expect(late.body.processingRisk).toBe(true);
    expect(late.body.riskReasons[0].basis).toMatch(/common practice/i);
    const early = await archivist.post('/api/prints').send(printWithFixer(batchId, '2024-02-20'));
    expect(codes(early.body)).toEqual([]);

    const risky = await archivist.get('/api/prints?processingRisk=true&pageSize=100');
    expect(risky.body.items.map((item: { id: number }) => item.id)).toContain(late.body.id);

    // Clearing the exhausted date clears the reason on the print made with it.
    await archivist.patch(`/api/solution-batches/${batchId}`).send({ exhaustedOn: null });
    const after = await archivist.get(`/api/prints/${late.body.id}`);
    expect(codes(after.body)).toEqual([]);
    expect(after.body.processingRisk).toBe(false);
  });

  // "c. 2024" spans 2022–2026 (CIRCA_SPREAD_YEARS = 2): the bath may have been spent.
  it('flags an exhausted fixer as possible for a print dated c. 2024', async () => {
    const archivist = await t.as('archivist');
    const batchId = await createBatch({
      code: 'FIX-CIRCA',
      kind: 'fixer',
      chemical: 'sodium thiosulfate',
      exhaustedOn: '2024-03-01',
    });
    const circa = await archivist.post('/api/prints').send(printWithFixer(batchId, 'c. 2024'));
    expect(circa.status).toBe(201);
    expect(codes(circa.body)).toEqual(['possibly-exhausted-fixer']);
    expect(circa.body.processingRisk).toBe(true);
  });

  // 100 ml at 20 sheets per litre (the default, common practice) fixes 2 sheets of 8×10 in.
  it('flags prints past a bath’s capacity, in the order made, and follows the setting', async () => {
    const archivist = await t.as('archivist');
    const batchId = await createBatch({
      code: 'FIX-CAP',
      kind: 'fixer',
      chemical: 'sodium thiosulfate',
      volumeMl: 100,
    });
    const ids: number[] = [];
    for (const madeOn of ['2025-01-03', '2025-01-01', '2025-01-02']) {
      const created = await archivist.post('/api/prints').send(printWithFixer(batchId, madeOn));
      ids.push(created.body.id);
    }
    const reasons = async (id: number) => codes((await archivist.get(`/api/prints/${id}`)).body);
    // Made third (3 sheets through a 2-sheet bath), though entered first.
    expect(await reasons(ids[0]!)).toEqual(['fixer-over-capacity']);
    expect(await reasons(ids[1]!)).toEqual([]);
    expect(await reasons(ids[2]!)).toEqual([]);

    const batch = await archivist.get(`/api/solution-batches/${batchId}`);
    expect(batch.body.fixerUse).toEqual({ sheets: 3, capacitySheets: 2, sheetsPerLitre: 20 });

    const admin = await t.as('admin');
    await admin.patch('/api/settings').send({ chemistry: { fixerCapacitySheetsPerLitre: 30 } });
    expect(await reasons(ids[0]!)).toEqual([]);
    await admin.patch('/api/settings').send({ chemistry: { fixerCapacitySheetsPerLitre: null } });
    expect(await reasons(ids[0]!)).toEqual(['fixer-over-capacity']);

    // Deleting an earlier print frees the bath for the later one.
    expect((await archivist.delete(`/api/prints/${ids[1]}`)).status).toBe(204);
    expect(await reasons(ids[0]!)).toEqual([]);
  });
});

describe('GET /api/solution-batches/:id', () => {
  it('lists the prints made with the batch for a viewer; 404, 422 and 401 otherwise', async () => {
    const batchId = await createBatch({
      code: 'SALT-T',
      kind: 'salting',
      chemical: 'sodium chloride',
      concentrationPercent: 2,
    });
    const steps = buildSaltSteps().map((step) =>
      step.stage === 'salting' ? { ...step, solutionBatchId: batchId } : step,
    );
    const created = await (
      await t.as('archivist')
    )
      .post('/api/prints')
      .send(buildPrint({ title: 'Salted with SALT-T', processing: steps }));
    const response = await (await t.as('viewer')).get(`/api/solution-batches/${batchId}`);
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ code: 'SALT-T', fixerUse: null });
    expect(response.body.prints).toEqual([
      expect.objectContaining({
        id: created.body.id,
        title: 'Salted with SALT-T',
        stages: ['salting'],
      }),
    ]);
    expectProblem(await (await t.as('viewer')).get('/api/solution-batches/99999'), 404);
    expectProblem(await (await t.as('viewer')).get('/api/solution-batches/x'), 422);
    expectProblem(await t.anonymous().get(`/api/solution-batches/${batchId}`), 401);
  });
});

describe('GET /api/negatives/:id/printing-log', () => {
  it('lists each print with paper, light and exposure, and suggests a starting exposure', async () => {
    const archivist = await t.as('archivist');
    const negative = await archivist.post('/api/negatives').send({ code: 'LOG-1', kind: 'film' });
    const paper = await archivist.post('/api/papers').send({ name: 'Log paper' });
    for (const [minutes, madeOn] of [
      [30, '2025-03-01'],
      [50, '2025-03-02'],
    ] as const) {
      const steps = buildSaltSteps().map((step) =>
        step.stage === 'exposure' ? { ...step, minutes } : step,
      );
      await archivist.post('/api/prints').send(
        buildPrint({
          title: `From LOG-1, ${minutes} min`,
          madeOn,
          negativeId: negative.body.id,
          paperId: paper.body.id,
          processing: steps,
        }),
      );
    }
    const response = await (
      await t.as('viewer')
    ).get(`/api/negatives/${negative.body.id}/printing-log`);
    expect(response.status).toBe(200);
    expect(response.body.negative.code).toBe('LOG-1');
    expect(
      response.body.prints.map((p: { exposureMinutes: number; lightSource: string }) => [
        p.exposureMinutes,
        p.lightSource,
      ]),
    ).toEqual([
      [30, 'open shade'],
      [50, 'open shade'],
    ]);
    expect(response.body.suggestions).toEqual([
      {
        paper: { id: paper.body.id, name: 'Log paper' },
        lightSource: 'open shade',
        suggestion: expect.objectContaining({ minutes: 40, low: 30, high: 50, basedOn: 2 }),
      },
    ]);
    expectProblem(await archivist.get('/api/negatives/99999/printing-log'), 404);
    expectProblem(await archivist.get('/api/negatives/abc/printing-log'), 422);
    expectProblem(await t.anonymous().get(`/api/negatives/${negative.body.id}/printing-log`), 401);
  });
});
