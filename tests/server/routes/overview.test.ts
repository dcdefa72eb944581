import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backupDatabase } from '../../../server/db/backup';
import { QueuedMail, User } from '../../../server/models';
import { buildLoggerCsv } from '../../support/environment';
import { buildPrint, buildSaltSteps } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';
import { testDatabaseDialect } from '../../support/test-database';
import { buildReadings, buildToneCheck } from '../../support/tone-factories';

let t: TestApp;
const DAY = 86_400_000;
const isoDay = (offsetDays: number) =>
  new Date(Date.now() + offsetDays * DAY).toISOString().slice(0, 10);
const printIds: number[] = [];

interface Item {
  kind: string;
  count: number | null;
  label: string;
  href: string;
}
const byKind = (items: Item[]) => Object.fromEntries(items.map((item) => [item.kind, item]));

async function overviewOf(role: Parameters<TestApp['as']>[0]) {
  const response = await (await t.as(role)).get('/api/overview');
  expect(response.status).toBe(200);
  expect(response.body.role).toBe(role);
  for (const item of response.body.items as Item[]) {
    expect(item).toEqual({
      kind: expect.any(String),
      count: item.count === null ? null : expect.any(Number),
      label: expect.any(String),
      href: expect.stringMatching(/^\//),
    });
  }
  return byKind(response.body.items as Item[]);
}

beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  for (const [title, washing] of [
    ['Sound wash', 20],
    ['Short wash', 3],
    ['Due soon', 20],
  ] as const) {
    const created = await archivist
      .post('/api/prints')
      .send(buildPrint({ title, madeOn: '2023', processing: buildSaltSteps({ washing }) }));
    printIds.push(created.body.id);
  }
  // A yellowing second check opens a status alert.
  const conservator = await t.as('conservator');
  await conservator
    .post(`/api/prints/${printIds[0]}/tone-checks`)
    .send(buildToneCheck({ checkedOn: '2024-03-02', baseline: true }));
  await conservator
    .post(`/api/prints/${printIds[0]}/tone-checks`)
    .send(buildToneCheck({ checkedOn: '2026-03-02', readings: buildReadings({ dminB: 9 }) }));
  // One print overdue, one due in three days, one a month away (outside the week).
  await t.ctx.sequelize.query('UPDATE prints SET next_check_due = ? WHERE id = ?', {
    replacements: [isoDay(-10), printIds[0]],
  });
  await t.ctx.sequelize.query('UPDATE prints SET next_check_due = ? WHERE id = ?', {
    replacements: [isoDay(3), printIds[2]],
  });
  await t.ctx.sequelize.query('UPDATE prints SET next_check_due = ? WHERE id = ?', {
    replacements: [isoDay(30), printIds[1]],
  });
});
afterAll(() => t.close());

describe('GET /api/overview', () => {
  it("the conservator's: checks due this week and overdue, open alerts, status changes", async () => {
    const items = await overviewOf('conservator');
    expect(Object.keys(items)).toEqual([
      'checks-due',
      'checks-overdue',
      'open-alerts',
      'place-alerts',
      'status-changed',
    ]);
    expect(items['checks-due']).toMatchObject({ count: 1 });
    expect(items['checks-due']!.href).toBe(`/tone-watch/rounds?from=${isoDay(0)}&to=${isoDay(6)}`);
    // The week's round also lists the overdue print; the label says this count leaves it out.
    expect(items['checks-due']!.label).toMatch(/not yet overdue/);
    expect(items['checks-overdue']).toMatchObject({ count: 1 });
    expect(items['open-alerts']).toMatchObject({ count: 1, href: '/tone-watch' });
    // First visit: "since your last visit" falls back to the last 30 days.
    expect(items['status-changed']).toMatchObject({ count: 1 });
    expect(items['status-changed']!.label).toMatch(/last 30 days/);
  });

  it('counts places outside their band until a conservator acknowledges them', async () => {
    expect((await overviewOf('conservator'))['place-alerts']).toMatchObject({
      count: 0,
      href: '/tone-watch#place-alerts',
    });
    const archivist = await t.as('archivist');
    const cabinet = (
      await archivist.post('/api/locations').send({ code: 'OV-C', name: 'Damp cabinet' })
    ).body.id as number;
    const conservator = await t.as('conservator');
    // Three days at 62 % RH: longer than the default spell allowed outside the band.
    const damp = buildLoggerCsv({
      serial: 'OV-1',
      start: '2026-05-01',
      days: 5,
      climate: (i) => [17, i >= 24 && i < 96 ? 62 : 45],
    });
    const upload = await conservator
      .post(`/api/locations/${cabinet}/readings`)
      .attach('file', Buffer.from(damp), 'd.csv');
    expect(upload.body.alertsOpened).toBe(1);
    expect((await overviewOf('conservator'))['place-alerts']).toMatchObject({ count: 1 });
    const [alert] = (await conservator.get('/api/environment-alerts')).body.items;
    await conservator.post(`/api/environment-alerts/${alert.id}/acknowledgement`);
    expect((await overviewOf('conservator'))['place-alerts']).toMatchObject({ count: 0 });
  });

  it('counts status changes since the person marked them seen, not since a sign-in', async () => {
    const conservator = await User.findOne({ where: { role: 'conservator' } });
    await conservator!.update({ toneChangesSeenAt: new Date(Date.now() - DAY) });
    const first = await overviewOf('conservator');
    expect(first['status-changed']).toMatchObject({ count: 1 });
    expect(first['status-changed']!.label).toMatch(/since you last marked them seen/);
    // Signing in again (a second device, a second sign-in) does not hide the change.
    await signIn(t.app, 'conservator@test.example', TEST_PASSWORD);
    await signIn(t.app, 'conservator@test.example', TEST_PASSWORD);
    expect((await overviewOf('conservator'))['status-changed']).toMatchObject({ count: 1 });
    // Marking them seen does.
    const marked = await (
      await t.as('conservator')
    )
      .post('/api/overview/seen')
      .send({ kind: 'status-changed' });
    expect(marked.status).toBe(204);
    expect((await overviewOf('conservator'))['status-changed']).toMatchObject({ count: 0 });
  });

  it('marking seen: conservators and admins; a wrong kind is refused by field', async () => {
    const admin = await t.as('admin');
    expect((await admin.post('/api/overview/seen').send({ kind: 'status-changed' })).status).toBe(
      204,
    );
    expectProblem(await admin.post('/api/overview/seen').send({ kind: 'alerts' }), 422);
    expectProblem(
      await (await t.as('viewer')).post('/api/overview/seen').send({ kind: 'status-changed' }),
      403,
    );
    expectProblem(
      await (await t.as('archivist')).post('/api/overview/seen').send({ kind: 'status-changed' }),
      403,
    );
  });

  it("the archivist's: recent accessions, images processing, imports, processing concerns", async () => {
    const items = await overviewOf('archivist');
    expect(items['recent-accessions']).toMatchObject({ count: 3 });
    expect(items['images-processing']).toMatchObject({ count: 0, href: '/prints' });
    expect(items['imports-under-way']).toMatchObject({ count: 0, href: '/imports' });
    expect(items['processing-concerns']).toMatchObject({
      count: 1,
      href: '/prints?processingRisk=true',
    });
  });

  it("the curator's: their own saved searches, the checklists and the loans under way", async () => {
    const curator = await t.as('curator');
    await curator
      .post('/api/saved-searches')
      .send({ name: 'Short washes', query: 'washingMinutesMax=5' });
    await curator.post('/api/checklists').send({ name: 'Spring hang', printIds });
    // Another person's saved search is not theirs.
    await (
      await t.as('conservator')
    )
      .post('/api/saved-searches')
      .send({ name: 'Mine', query: 'q=pond' });
    // Two loans planned, one then withdrawn: only the one still under way counts.
    const show = {
      kind: 'exhibition',
      venue: 'East gallery',
      startsOn: '2026-06-01',
      endsOn: '2026-06-30',
      hoursPerDay: 8,
      maxLux: 50,
      printIds,
    };
    await curator
      .post('/api/loans')
      .send({ ...show, title: 'Summer show' })
      .expect(201);
    const dropped = await curator.post('/api/loans').send({ ...show, title: 'Dropped show' });
    await curator.patch(`/api/loans/${dropped.body.id}`).send({ stage: 'withdrawn' }).expect(200);
    const items = await overviewOf('curator');
    expect(items['saved-searches']).toMatchObject({ count: 1, href: '/search' });
    expect(items.checklists).toMatchObject({ count: 1, href: '/checklists' });
    expect(items['open-loans']).toMatchObject({ count: 1, href: '/loans' });
    expect(Object.keys(items)).toEqual(['saved-searches', 'checklists', 'open-loans']);
  });

  it("the admin's: undelivered mail, open invitations, fixity, backup age, disk use", async () => {
    const before = await overviewOf('admin');
    expect(before.fixity).toMatchObject({ count: null, label: 'No fixity check run yet' });
    // Backups and disk lead to the part of Fixity that shows them and says how backups are
    // made; the start page's words name no command.
    expect(before['backup-age']).toMatchObject({
      count: null,
      label: 'No backup recorded',
      href: '/fixity#backups',
    });
    expect(before['uploads-disk']!.href).toBe('/fixity#backups');
    expect(before['invitations-open']).toMatchObject({ count: 0 });

    await (
      await t.as('admin')
    )
      .post('/api/users/invitations')
      .send({ email: 'new.person@test.example', role: 'viewer' });
    await QueuedMail.create({
      recipients: 'gone@test.example',
      subject: 'x',
      textBody: 'x',
      htmlBody: '<p>x</p>',
      status: 'failed',
      attempts: 6,
      nextAttemptAt: new Date(),
    });
    if (testDatabaseDialect() === 'sqlite') {
      await backupDatabase(t.ctx.config.databaseUrl, join(t.dir, 'backup.sqlite'));
    } else {
      // PostgreSQL is copied with its own tools; the page reads whatever row records one.
      await t.ctx.sequelize.query('INSERT INTO backups (made_at, bytes) VALUES (?, ?)', {
        replacements: [new Date(), 1],
      });
    }
    const items = await overviewOf('admin');
    expect(items['invitations-open']).toMatchObject({ count: 1, href: '/people' });
    expect(items['mail-undelivered']!.count).toBeGreaterThanOrEqual(1);
    expect(items['backup-age']).toMatchObject({ count: 0 });
    expect(items['backup-age']!.label).toContain(isoDay(0));
    expect(items['uploads-disk']).toMatchObject({ count: 0 });
    expect(items['uploads-disk']!.label).toMatch(/^Originals take 0 bytes; .* free on the disk$/);
  });

  it("the viewer's: recent additions only", async () => {
    const items = await overviewOf('viewer');
    expect(items).toEqual({
      'recent-additions': {
        kind: 'recent-additions',
        count: 3,
        label: 'Prints added to the catalogue in the last 30 days',
        href: '/prints?sort=-accession',
      },
    });
  });

  it('needs a session, and refuses unknown parameters with problem details', async () => {
    expectProblem(await t.anonymous().get('/api/overview'), 401);
    const bad = await (await t.as('viewer')).get('/api/overview?role=admin');
    expectProblem(bad, 422);
  });
});
