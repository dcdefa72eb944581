import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays } from '../../../shared/domain/tone/dates';
import { buildCgatsFile } from '../../support/cgats';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';
import { buildToneCheck } from '../../support/tone-factories';

let t: TestApp;
let exact: number;
let circa: number;
let exactAccession: string;
const today = new Date().toISOString().slice(0, 10);
const tomorrow = addDays(today, 1);

beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  const made = await archivist
    .post('/api/prints')
    .send(buildPrint({ title: 'Made on a known day', madeOn: '2025-05-10' }));
  exact = made.body.id;
  exactAccession = made.body.accessionNumber;
  circa = (await archivist.post('/api/prints').send(buildPrint({ madeOn: 'c. 2025' }))).body.id;
});
afterAll(() => t.close());

const pathOf = (response: { body: { errors?: Array<{ path: string }> } }) =>
  response.body.errors?.map((e) => e.path);

describe('dates of tone checks', () => {
  it('refuses a check dated after today, and one before the print was made (422)', async () => {
    const conservator = await t.as('conservator');
    const future = await conservator
      .post(`/api/prints/${exact}/tone-checks`)
      .send(buildToneCheck({ checkedOn: tomorrow }));
    expectProblem(future, 422);
    expect(pathOf(future)).toEqual(['checkedOn']);
    const early = await conservator
      .post(`/api/prints/${exact}/tone-checks`)
      .send(buildToneCheck({ checkedOn: '2025-05-09' }));
    expectProblem(early, 422);
    expect(early.body.errors[0].message).toMatch(/before the print was made \(2025-05-10\)/);
    // Nothing was stored: the print is still unchecked.
    expect((await conservator.get(`/api/prints/${exact}`)).body.tone.status).toBe('unchecked');
  });

  it('allows a check on the making day, with the dry-down warning', async () => {
    const conservator = await t.as('conservator');
    const sameDay = await conservator
      .post(`/api/prints/${exact}/tone-checks`)
      .send(buildToneCheck({ checkedOn: '2025-05-10', baseline: true }));
    expect(sameDay.status).toBe(201);
    expect(sameDay.body.warnings.join(' ')).toMatch(/dries down/);
  });

  it('refuses the same dates when a check is corrected', async () => {
    const conservator = await t.as('conservator');
    const check = await conservator
      .post(`/api/prints/${exact}/tone-checks`)
      .send(buildToneCheck({ checkedOn: '2025-08-01' }));
    expectProblem(
      await conservator.patch(`/api/tone-checks/${check.body.id}`).send({ checkedOn: tomorrow }),
      422,
    );
    expectProblem(
      await conservator
        .patch(`/api/tone-checks/${check.body.id}`)
        .send({ checkedOn: '2024-12-31' }),
      422,
    );
    const moved = await conservator
      .patch(`/api/tone-checks/${check.body.id}`)
      .send({ checkedOn: '2025-09-01' });
    expect(moved.status).toBe(200);
  });

  it('compares an approximate making date with the start of its range (c. 2025 → 2023)', async () => {
    const conservator = await t.as('conservator');
    expectProblem(
      await conservator
        .post(`/api/prints/${circa}/tone-checks`)
        .send(buildToneCheck({ checkedOn: '2022-12-31' })),
      422,
    );
    const within = await conservator
      .post(`/api/prints/${circa}/tone-checks`)
      .send(buildToneCheck({ checkedOn: '2023-06-01' }));
    expect(within.status).toBe(201);
  });

  it('skips import rows dated in the future or before the print was made', async () => {
    const conservator = await t.as('conservator');
    const cgats = (created: string) =>
      buildCgatsFile([`1 "${exactAccession}/dmax" 28.4 6.1 9.8`], { created });
    for (const created of [tomorrow, '2025-01-02']) {
      const result = await conservator
        .post('/api/tone-checks/import')
        .attach('file', cgats(created), 'round.txt');
      expect(result.status).toBe(201);
      expect(result.body.created).toBe(0);
      expect(result.body.skipped).toHaveLength(1);
      expect(result.body.skipped[0].reason).toMatch(/future|before the print was made/);
    }
  });
});
