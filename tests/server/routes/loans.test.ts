import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Process } from '../../../shared/domain/vocabulary';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { buildToneCheck } from '../../support/tone-factories';
import { asBuffer, readPdf } from '../../support/read-pdf';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let store: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  store = (await archivist.post('/api/locations').send({ code: 'LN-S', name: 'Store' })).body.id;
});
afterAll(() => t.close());

const today = () => new Date().toISOString().slice(0, 10);

async function saltPrints(count: number, process: Process = 'salt print'): Promise<number[]> {
  const archivist = await t.as('archivist');
  const ids: number[] = [];
  for (let n = 0; n < count; n++) {
    const body = buildPrint({ title: `Loan print ${n}`, process, locationId: store });
    const created = await archivist.post('/api/prints').send(body);
    expect(created.status).toBe(201);
    ids.push(created.body.id);
  }
  return ids;
}

const june = {
  kind: 'exhibition',
  venue: 'County museum, east gallery',
  contact: 'Registrar, +00 000 000',
  startsOn: '2026-06-01',
  endsOn: '2026-06-30',
  hoursPerDay: 8,
  maxLux: 50,
  maxUv: 10,
  temperatureC: { min: 18, max: 22 },
  humidityPercent: { min: 45, max: 55 },
};

describe('loans and exhibitions', () => {
  it('plans a show and says which prints would pass their light limit, and by how much', async () => {
    const [early, ...rest] = await saltPrints(5);
    const curator = await t.as('curator');
    const conservator = await t.as('conservator');
    // An earlier agreed show in March: 50 lx × 6 h × 31 days = 9,300 lx·h for one print.
    const march = await curator.post('/api/loans').send({
      ...june,
      title: 'March show',
      startsOn: '2026-03-01',
      endsOn: '2026-03-31',
      hoursPerDay: 6,
      printIds: [early],
    });
    expect(march.status).toBe(201);
    expect(
      (await conservator.patch(`/api/loans/${march.body.id}`).send({ conditionsSigned: true }))
        .status,
    ).toBe(200);
    expect(
      (await curator.patch(`/api/loans/${march.body.id}`).send({ stage: 'agreed' })).body.stage,
    ).toBe('agreed');

    // June: 50 lx × 8 h × 30 days = 12,000 lx·h each; with March's 9,300 one print reaches
    // 21,300, past the 15,000 lx·h salt-print limit (CIE 157:2004, from memory) by 6,300.
    const planned = await curator
      .post('/api/loans')
      .send({ ...june, title: 'River prints', printIds: [early, ...rest] });
    expect(planned.status).toBe(201);
    expect(planned.body.stage).toBe('proposed');
    expect(planned.body.printsOverLimit).toBe(1);
    const first = planned.body.prints.find((p: { id: number }) => p.id === early);
    expect(first.light).toEqual({
      annualLimit: 15_000,
      plannedLuxHours: 12_000,
      excess: [
        {
          year: 2026,
          alreadyLuxHours: 9_300,
          plannedLuxHours: 12_000,
          limit: 15_000,
          overBy: 6_300,
        },
      ],
    });
    const other = planned.body.prints.find((p: { id: number }) => p.id === rest[0]);
    expect(other.light.excess).toEqual([]);

    // A proposal counts only in its own plan; the agreed March show counts in the dose.
    const light = await (await t.as('viewer')).get(`/api/prints/${early}/light`);
    expect(light.body).toEqual({
      lifetimeLuxHours: 9_300,
      years: [{ year: 2026, luxHours: 9_300, limit: 15_000 }],
    });
  });

  it('conditions: a curator may not set or sign them; a conservator signs; the agreement needs it', async () => {
    const ids = await saltPrints(1);
    const curator = await t.as('curator');
    const loan = (
      await curator.post('/api/loans').send({ ...june, title: 'Signed', printIds: ids })
    ).body;
    expectProblem(await curator.patch(`/api/loans/${loan.id}`).send({ maxLux: 80 }), 403);
    expectProblem(
      await curator.patch(`/api/loans/${loan.id}`).send({ conditionsSigned: true }),
      403,
    );
    expectProblem(await curator.patch(`/api/loans/${loan.id}`).send({ stage: 'agreed' }), 409);
    const conservator = await t.as('conservator');
    const signed = await conservator
      .patch(`/api/loans/${loan.id}`)
      .send({ conditionsSigned: true });
    expect(signed.body.conditionsSigned).toMatchObject({
      on: today(),
      by: { name: expect.any(String) },
    });
    // New conditions need signing again.
    const changed = await conservator.patch(`/api/loans/${loan.id}`).send({ maxLux: 40 });
    expect(changed.body.conditionsSigned).toBeNull();
  });

  it('prints go out and come back through movements; condition reports are linked', async () => {
    const ids = await saltPrints(2);
    const curator = await t.as('curator');
    const conservator = await t.as('conservator');
    const archivist = await t.as('archivist');
    const loan = (
      await curator.post('/api/loans').send({ ...june, kind: 'loan', title: 'Out', printIds: ids })
    ).body;
    await conservator.patch(`/api/loans/${loan.id}`).send({ conditionsSigned: true });
    await curator.patch(`/api/loans/${loan.id}`).send({ stage: 'agreed' });
    const report = await conservator
      .post(`/api/prints/${ids[0]}/condition-reports`)
      .send({ reportedOn: today(), grade: 'settled', observations: [] });
    expect(report.status).toBe(201);
    const linked = await conservator
      .patch(`/api/loans/${loan.id}`)
      .send({ conditionReports: [{ printId: ids[0], departureReportId: report.body.id }] });
    expect(linked.body.prints[0].departureReportId).toBe(report.body.id);
    expectProblem(
      await conservator
        .patch(`/api/loans/${loan.id}`)
        .send({ conditionReports: [{ printId: ids[1], departureReportId: report.body.id }] }),
      422,
    );
    // A curator may not send prints out; an archivist does.
    expectProblem(await curator.patch(`/api/loans/${loan.id}`).send({ stage: 'away' }), 403);
    const away = await archivist.patch(`/api/loans/${loan.id}`).send({ stage: 'away' });
    expect(away.body.stage).toBe('away');
    const out = (await archivist.get(`/api/prints/${ids[0]}/movements`)).body.items[0];
    expect(out).toMatchObject({
      reason: 'loan',
      from: { id: store },
      to: { code: `LOAN-${loan.id}` },
    });
    const back = await archivist.patch(`/api/loans/${loan.id}`).send({ stage: 'back' });
    expect(back.body.stage).toBe('back');
    const home = (await archivist.get(`/api/prints/${ids[0]}/movements`)).body.items[0];
    expect(home).toMatchObject({ reason: 'return', to: { id: store } });
    expect((await archivist.get(`/api/prints/${ids[1]}`)).body.location.id).toBe(store);
    expectProblem(await archivist.patch(`/api/loans/${loan.id}`).send({ stage: 'away' }), 409);

    // The courier's sheet: conditions, each print, its condition at departure.
    const pdf = await asBuffer(curator.get(`/api/loans/${loan.id}/report.pdf`));
    expect(pdf.status).toBe(200);
    const { text } = await readPdf(pdf.body as Buffer);
    expect(text).toContain('Illuminance at most 50 lx');
    expect(text).toContain('Condition at departure: settled');
    expect(text).toContain('CIE 157:2004');
  });

  it('viewers read loans without contacts or places; refuses bad input and unknown ids', async () => {
    const curator = await t.as('curator');
    const loan = (await curator.post('/api/loans').send({ ...june, title: 'Seen', printIds: [] }))
      .body;
    expect(loan.contact).toBe(june.contact);
    const viewer = await t.as('viewer');
    const seen = await viewer.get(`/api/loans/${loan.id}`);
    expect(seen.status).toBe(200);
    expect(seen.body).not.toHaveProperty('contact');
    expect(seen.body).not.toHaveProperty('awayPlace');
    expect((await viewer.get('/api/loans')).body.items.map((l: { id: number }) => l.id)).toContain(
      loan.id,
    );
    expectProblem(await viewer.post('/api/loans').send({ ...june, title: 'No' }), 403);
    expectProblem(await viewer.get(`/api/loans/${loan.id}/report.pdf`), 403);
    expectProblem(await t.anonymous().get('/api/loans'), 401);
    expectProblem(
      await curator
        .post('/api/loans')
        .send({ ...june, title: 'Back to front', endsOn: '2026-05-01' }),
      422,
    );
    expectProblem(
      await curator.post('/api/loans').send({ ...june, title: 'X', printIds: [999999] }),
      422,
    );
    expectProblem(await curator.get('/api/loans/999999'), 404);
    expectProblem(await viewer.get('/api/prints/999999/light'), 404);
  });

  it('groups tone change by light received', async () => {
    const [shown] = await saltPrints(1);
    const curator = await t.as('curator');
    const conservator = await t.as('conservator');
    const loan = (
      await curator.post('/api/loans').send({ ...june, title: 'Cohort', printIds: [shown] })
    ).body;
    await conservator.patch(`/api/loans/${loan.id}`).send({ conditionsSigned: true });
    await curator.patch(`/api/loans/${loan.id}`).send({ stage: 'agreed' });
    const check = await conservator
      .post(`/api/prints/${shown}/tone-checks`)
      .send(buildToneCheck({ checkedOn: today(), baseline: true }));
    expect(check.status).toBe(201);
    const response = await (await t.as('viewer')).get('/api/cohorts?by=light');
    expect(response.status).toBe(200);
    // June's 12,000 lx·h put the checked print in the band up to 15,000 lx·h.
    const band = response.body.groups.find((group: { key: string }) => group.key === 'lt15k');
    expect(band).toMatchObject({ label: 'Up to 15,000 lx·h' });
    expect(band.prints).toBeGreaterThanOrEqual(1);
  });
});
