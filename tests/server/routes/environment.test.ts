import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { relativeDecayRate } from '../../../shared/domain/environment/decay-rate';
import { buildLoggerCsv } from '../../support/environment';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let cabinet: number;
let drawer: number;
let other: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  const place = async (code: string, name: string, parentId: number | null = null) =>
    (await archivist.post('/api/locations').send({ code, name, parentId })).body.id as number;
  const room = await place('ENV-R', 'Test room');
  cabinet = await place('ENV-C1', 'Warm cabinet', room);
  drawer = await place('ENV-C1-D1', 'Drawer 1', cabinet);
  other = await place('ENV-C2', 'Cool cabinet', room);
  const print = await archivist.post('/api/prints').send(buildPrint({ locationId: drawer }));
  expect(print.status).toBe(201);
});
afterAll(() => t.close());

const steady = (t: number, rh: number) => () => [t, rh] as [number, number];

describe('POST /api/locations/:id/readings', () => {
  it('a dry run reports what it found and writes nothing, not even the logger', async () => {
    const conservator = await t.as('conservator');
    const file = buildLoggerCsv({
      serial: 'DRY-1',
      start: '2026-01-01',
      days: 2,
      climate: steady(19, 45),
    });
    const dry = await conservator
      .post(`/api/locations/${other}/readings?dryRun=1`)
      .attach('file', Buffer.from(file), 'log.csv');
    expect(dry.status).toBe(200);
    expect(dry.body).toMatchObject({
      dryRun: true,
      accepted: 48,
      days: 2,
      logger: { key: 'DRY-1', remembered: false },
    });
    const environment = await conservator.get(`/api/locations/${other}/environment`);
    expect(environment.body.source).toBeNull();
    expect(environment.body.days).toEqual([]);
    const again = await conservator
      .post(`/api/locations/${other}/readings?dryRun=1`)
      .attach('file', Buffer.from(file), 'log.csv');
    expect(again.body.logger.remembered).toBe(false);
  });

  it('stores readings with day summaries; a second upload of the same file adds nothing', async () => {
    const conservator = await t.as('conservator');
    const file = buildLoggerCsv({
      serial: 'LG-7',
      start: '2026-03-01',
      days: 10,
      climate: (_i, hour) => [16 + (hour >= 12 ? 2 : 0), 44 + (hour >= 12 ? 4 : 0)],
    });
    const first = await conservator
      .post(`/api/locations/${cabinet}/readings`)
      .attach('file', Buffer.from(file), 'a.csv');
    expect(first.status).toBe(201);
    expect(first.body).toMatchObject({
      accepted: 240,
      days: 10,
      intervalMinutes: 60,
      alreadyStored: 0,
    });
    const second = await conservator
      .post(`/api/locations/${cabinet}/readings`)
      .attach('file', Buffer.from(file), 'a.csv');
    expect(second.body).toMatchObject({ accepted: 0, alreadyStored: 240 });

    const environment = await conservator.get(`/api/locations/${cabinet}/environment`);
    expect(environment.status).toBe(200);
    expect(environment.body.days).toHaveLength(10);
    expect(environment.body.days[0]).toMatchObject({
      day: '2026-03-01',
      readings: 24,
      temperature: { min: 16, max: 18, mean: 17 },
      rh: { min: 44, max: 48, mean: 46 },
    });
    // Half the hours at 16 °C / 44 %, half at 18 °C / 48 %: the mean of the two rates.
    const expected = (relativeDecayRate(16, 44) + relativeDecayRate(18, 48)) / 2;
    expect(environment.body.figures.relativeRate).toBeCloseTo(expected, 9);
    expect(environment.body.figures.dailyRhSwingMax).toBeCloseTo(4, 9);
    expect(environment.body.band.key).toBe('silver-extended');
    expect(environment.body.source).toMatchObject({ id: cabinet, inherited: false });
  });

  it('remembers the mapping and time zone per logger', async () => {
    const conservator = await t.as('conservator');
    const file = (start: string) =>
      buildLoggerCsv({
        serial: 'ZONE-9',
        start,
        days: 1,
        header: ['Zeitpunkt', 'T', 'F'],
        climate: steady(18, 40),
      });
    const first = await conservator
      .post(`/api/locations/${other}/readings`)
      .field('timeZone', 'Europe/Berlin')
      .field('mapping', JSON.stringify({ timestamp: 'Zeitpunkt', temperature: 'T', humidity: 'F' }))
      .attach('file', Buffer.from(file('2026-01-10')), 'z.csv');
    expect(first.status).toBe(201);
    // 00:00 in Berlin in January is 23:00 UTC the day before (CET = UTC+1).
    expect(first.body.from).toBe('2026-01-09T23:00:00.000Z');
    const second = await conservator
      .post(`/api/locations/${other}/readings`)
      .attach('file', Buffer.from(file('2026-01-11')), 'z.csv');
    expect(second.status).toBe(201);
    expect(second.body).toMatchObject({
      logger: { key: 'ZONE-9', remembered: true },
      timeZone: 'Europe/Berlin',
      accepted: 24,
    });
    expect(second.body.mapping).toMatchObject({
      timestamp: 'Zeitpunkt',
      temperature: 'T',
      humidity: 'F',
    });
  });

  it('refuses what it cannot use: bad zone, bad mapping, a file without the columns, no file, an unknown place', async () => {
    const conservator = await t.as('conservator');
    const file = Buffer.from(
      buildLoggerCsv({ start: '2026-01-01', days: 1, climate: steady(18, 40) }),
    );
    const zone = await conservator
      .post(`/api/locations/${other}/readings`)
      .field('timeZone', 'Mars/Olympus')
      .attach('file', file, 'f.csv');
    expectProblem(zone, 422);
    const mapping = await conservator
      .post(`/api/locations/${other}/readings`)
      .field('mapping', '{nope')
      .attach('file', file, 'f.csv');
    expectProblem(mapping, 422);
    const columns = await conservator
      .post(`/api/locations/${other}/readings`)
      .attach('file', Buffer.from('a,b,c\n1,2,3\n'), 'f.csv');
    expectProblem(columns, 422);
    expectProblem(await conservator.post(`/api/locations/${other}/readings`), 422);
    expectProblem(
      await conservator.post('/api/locations/99999/readings').attach('file', file, 'f.csv'),
      404,
    );
  });

  it('a curator may not upload (403); nobody signed in 401', async () => {
    const file = Buffer.from(
      buildLoggerCsv({ start: '2026-01-01', days: 1, climate: steady(18, 40) }),
    );
    expectProblem(
      await (
        await t.as('curator')
      )
        .post(`/api/locations/${other}/readings`)
        .attach('file', file, 'f.csv'),
      403,
    );
    expect(
      (await t.anonymous().post(`/api/locations/${other}/readings`)).status,
    ).toBeGreaterThanOrEqual(401);
  });
});

describe('GET /api/locations/:id/environment', () => {
  it('a drawer without readings shows its cabinet’s, with its prints and their tone rates', async () => {
    const curator = await t.as('curator');
    const environment = await curator.get(`/api/locations/${drawer}/environment`);
    expect(environment.status).toBe(200);
    expect(environment.body.source).toMatchObject({ id: cabinet, code: 'ENV-C1', inherited: true });
    expect(environment.body.days.length).toBeGreaterThan(0);
    expect(environment.body.prints.count).toBe(1);
    expect(environment.body.prints.items[0]).toMatchObject({
      title: 'Mill pond at dusk',
      process: 'salt print',
    });
  });

  it('a viewer reads the figures but not which prints are kept there', async () => {
    const viewer = await t.as('viewer');
    const environment = await viewer.get(`/api/locations/${drawer}/environment`);
    expect(environment.status).toBe(200);
    expect(environment.body.figures.readings).toBeGreaterThan(0);
    expect(environment.body.prints).toBeNull();
    expect(environment.body.alerts).toEqual([]);
  });

  it('a week gives the raw readings; a longer period only the days', async () => {
    const conservator = await t.as('conservator');
    const week = await conservator.get(
      `/api/locations/${cabinet}/environment?from=2026-03-02&to=2026-03-08`,
    );
    expect(week.body.days).toHaveLength(7);
    expect(week.body.readings).toHaveLength(7 * 24);
    const month = await conservator.get(
      `/api/locations/${cabinet}/environment?from=2026-03-01&to=2026-03-31`,
    );
    expect(month.body.readings).toBeNull();
  });

  it('refuses a period ending before it starts, or longer than five years; 404 for an unknown place', async () => {
    const conservator = await t.as('conservator');
    expectProblem(
      await conservator.get(`/api/locations/${cabinet}/environment?from=2026-03-02&to=2026-03-01`),
      422,
    );
    expectProblem(
      await conservator.get(`/api/locations/${cabinet}/environment?from=2016-01-01&to=2026-03-01`),
      422,
    );
    expectProblem(await conservator.get('/api/locations/99999/environment'), 404);
    expect((await t.anonymous().get(`/api/locations/${cabinet}/environment`)).status).toBe(401);
  });
});

describe('alerts for places outside their band', () => {
  it('three damp days open one alert; a short spell none; conservators list and acknowledge it', async () => {
    const conservator = await t.as('conservator');
    const damp = buildLoggerCsv({
      serial: 'DAMP-1',
      start: '2026-05-01',
      days: 5,
      // Hours 24–95 (three days) at 62 % RH; a 6-hour spell at 58 % on the last day.
      climate: (i) => [17, i >= 24 && i < 96 ? 62 : i >= 100 && i < 106 ? 58 : 45],
    });
    const upload = await conservator
      .post(`/api/locations/${cabinet}/readings`)
      .attach('file', Buffer.from(damp), 'd.csv');
    expect(upload.body.alertsOpened).toBe(1);
    const list = await conservator.get('/api/environment-alerts');
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(1);
    expect(list.body.items[0]).toMatchObject({
      kind: 'too-damp',
      place: { id: cabinet },
      acknowledgedAt: null,
    });
    expect(list.body.items[0].reason).toMatch(
      /damper than its band \(at most 50 % RH\) for 3\.0 days from 2026-05-02 00:00 UTC, reaching 62 % RH/,
    );
    const again = await conservator
      .post(`/api/locations/${cabinet}/readings`)
      .attach('file', Buffer.from(damp), 'd.csv');
    expect(again.body.alertsOpened).toBe(0);

    const id = list.body.items[0].id;
    const acknowledged = await conservator.post(`/api/environment-alerts/${id}/acknowledgement`);
    expect(acknowledged.status).toBe(200);
    expect(acknowledged.body.acknowledgedBy.email).toMatch(/conservator/);
    expectProblem(await (await t.as('curator')).get('/api/environment-alerts'), 403);
    expectProblem(await conservator.post('/api/environment-alerts/99999/acknowledgement'), 404);
  });
});
