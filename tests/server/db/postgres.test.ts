import request from 'supertest';
import { QueryTypes, type Transaction } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dialectOf } from '../../../server/db/dialect';
import { writeTransaction } from '../../../server/db/write-transaction';
import { insertQueuedMail } from '../../../server/repositories/mail-repository';
import { handleJobs } from '../../../server/services/jobs';
import { scheduleToneDigest } from '../../../server/services/tone/digest';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { buildCsv, buildCsvRow, CSV_MAPPING, waitForImport } from '../../support/imports';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';
import { testDatabaseDialect } from '../../support/test-database';

/**
 * What only PostgreSQL needs: the dialect module's SQL, the write lock shared by every
 * process on the database, and two server instances on one database. Runs when the API
 * project runs against PostgreSQL (the `api-postgres` project, which `.ci/run` enables).
 */
/** Notices between instances arrive in milliseconds; a loaded CI machine gets a bound. */
const POLL = { timeout: 10_000 };

describe.runIf(testDatabaseDialect() === 'postgres')('on PostgreSQL', () => {
  let a: TestApp;
  let b: TestApp;
  beforeAll(async () => {
    a = await startTestApp();
    // A second instance on the same database: its own process state, no users of its own.
    // Originals on one shared disk, as several instances need (or one bucket).
    b = await startTestApp(
      { databaseUrl: a.ctx.config.databaseUrl, uploadsDir: a.ctx.config.uploadsDir },
      { users: false },
    );
  });
  afterAll(async () => {
    await b.close();
    await a.close();
  });

  const one = async <T extends object>(sql: string) =>
    (await a.ctx.sequelize.query<T>(sql, { type: QueryTypes.SELECT }))[0]!;

  it('needs no index hints and casts bound values', async () => {
    const dialect = dialectOf(a.ctx.sequelize);
    expect(dialect.name).toBe('postgres');
    expect(dialect.indexHint('prints_live_risk')).toBe('');
    const typed = await one<{ flags: unknown; due: unknown }>(
      `SELECT v.column1 AS flags, v.column2 AS due
         FROM (VALUES (${dialect.typed("'[1,2]'", 'json')}, ${dialect.typed('NULL', 'date')})) AS v`,
    );
    expect(typed).toEqual({ flags: [1, 2], due: null });
    const counted = await one<{ n: unknown }>(
      `SELECT COUNT(*) AS n FROM prints WHERE has_processing_risk = ${dialect.true}`,
    );
    // int8 read as a number, as SQLite gives it.
    expect(counted.n).toBe(0);
  });

  it('keeps a second writer waiting until the first commits, across connections', async () => {
    const { sequelize } = a.ctx;
    const dialect = dialectOf(sequelize);
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    const first = sequelize.transaction(async (transaction: Transaction) => {
      await dialect.lockForWrite(sequelize, transaction);
      await held;
    });
    await expect.poll(() => waitingForLock(true), POLL).toBe(1);
    // The other instance's pool: another process as far as the lock is concerned.
    const second = b.ctx.sequelize.transaction(async (transaction: Transaction) => {
      await dialectOf(b.ctx.sequelize).lockForWrite(b.ctx.sequelize, transaction);
    });
    await expect.poll(() => waitingForLock(false), POLL).toBe(1);
    release();
    await Promise.all([first, second]);
    expect(await waitingForLock(false)).toBe(0);
  });

  /** Advisory locks granted (or waited for) at this moment. */
  async function waitingForLock(granted: boolean): Promise<number> {
    const row = await one<{ n: number }>(
      `SELECT COUNT(*) AS n FROM pg_locks WHERE locktype = 'advisory' AND granted = ${granted}`,
    );
    return row.n;
  }

  it('finds a print created, renamed or deleted through one instance by searching the other', async () => {
    const throughA = await a.as('archivist');
    const throughB = await signIn(b.app, 'archivist@test.example', TEST_PASSWORD);
    await b.ctx.searchIndex.ready();
    const found = async (words: string) =>
      (
        (await throughB.get(`/api/prints?q=${encodeURIComponent(words)}`)).body.items as Array<{
          id: number;
        }>
      ).map((item) => item.id);
    const created = await throughA
      .post('/api/prints')
      .send(buildPrint({ title: 'Quarry lantern' }));
    expect(created.status).toBe(201);
    // Woken by NOTIFY at A's commit; polled, not timed.
    await expect.poll(() => found('quarry lantern'), POLL).toEqual([created.body.id]);
    await throughA.patch(`/api/prints/${created.body.id}`).send({ title: 'Orchard lantern' });
    await expect.poll(() => found('orchard'), POLL).toEqual([created.body.id]);
    expect(await found('quarry')).toEqual([]);
    await throughA.delete(`/api/prints/${created.body.id}`);
    await expect.poll(() => found('orchard'), POLL).toEqual([]);
  });

  it('gives unique accession numbers to creates through two instances at once', async () => {
    const throughA = await a.as('archivist');
    const throughB = await signIn(b.app, 'archivist@test.example', TEST_PASSWORD);
    const responses = await Promise.all(
      Array.from({ length: 16 }, (_, i) =>
        (i % 2 ? throughA : throughB)
          .post('/api/prints')
          .send(buildPrint({ title: `Two doors ${i}` })),
      ),
    );
    expect(responses.map((response) => response.status)).toEqual(Array(16).fill(201));
    const numbers = responses.map((response) => response.body.accessionNumber as string);
    expect(new Set(numbers).size).toBe(16);
    const stored = await one<{ n: number }>(
      "SELECT COUNT(*) AS n FROM prints WHERE title LIKE 'Two doors %'",
    );
    expect(stored.n).toBe(16);
  });

  it('runs a fixity check asked for through one instance once, on whichever takes it', async () => {
    const archivist = await a.as('archivist');
    const print = await archivist.post('/api/prints').send(buildPrint());
    const upload = await archivist
      .post(`/api/prints/${print.body.id}/assets`)
      .field('view', 'recto')
      .attach('file', await buildJpeg(300, 200, [150, 110, 80]), 'recto.jpg');
    expect(upload.status).toBe(201);
    await a.ctx.images.jobs.idle();
    const throughB = await signIn(b.app, 'admin@test.example', TEST_PASSWORD);
    const started = await throughB.post('/api/fixity-checks');
    expect(started.status).toBe(202);
    const admin = await a.as('admin');
    await expect
      .poll(
        async () => (await admin.get(`/api/fixity-checks/${started.body.id}`)).body.status,
        POLL,
      )
      .toBe('done');
    const done = (await admin.get(`/api/fixity-checks/${started.body.id}`)).body;
    expect(done).toMatchObject({ checked: 1, total: 1, mismatches: [], missing: [] });
    // pg-boss keeps one row per job: one job, taken and completed once.
    const jobs = await one<{ n: number; completed: number }>(
      `SELECT COUNT(*) AS n, COUNT(*) FILTER (WHERE state = 'completed') AS completed
         FROM pgboss.job WHERE name = 'fixity-check'`,
    );
    expect(jobs).toEqual({ n: 1, completed: 1 });
  });

  it('shows a tone re-evaluation started through one instance through the other, run once', async () => {
    const archivist = await a.as('archivist');
    for (let i = 0; i < 3; i += 1) {
      expect(
        (await archivist.post('/api/prints').send(buildPrint({ title: `Re-read ${i}` }))).status,
      ).toBe(201);
    }
    const adminA = await a.as('admin');
    const adminB = await signIn(b.app, 'admin@test.example', TEST_PASSWORD);
    const warn = (await adminA.get('/api/settings')).body.tone.watchDE00 as number;
    const changed = await adminA.patch('/api/settings').send({ tone: { watchDE00: warn + 0.5 } });
    expect(changed.status).toBe(200);
    const live = await one<{ n: number }>(
      'SELECT COUNT(*) AS n FROM prints WHERE deleted_at IS NULL',
    );
    // B never ran it, yet its settings page follows the run to its end.
    await expect
      .poll(async () => (await adminB.get('/api/settings')).body.reevaluation?.status, POLL)
      .toBe('done');
    const progress = (await adminB.get('/api/settings')).body.reevaluation;
    expect(progress).toMatchObject({ done: live.n, total: live.n });
    expect(progress.startedAt).toBe(changed.body.reevaluation.startedAt);
    const jobs = await one<{ n: number; completed: number }>(
      `SELECT COUNT(*) AS n, COUNT(*) FILTER (WHERE state = 'completed') AS completed
         FROM pgboss.job WHERE name = 'tone-reevaluation'`,
    );
    expect(jobs).toEqual({ n: 1, completed: 1 });
  });

  it("makes an upload's derivatives once, queued once per original however many instances ask", async () => {
    // No instance takes jobs for a moment, so the upload's job is seen waiting.
    await a.ctx.jobs.pause();
    await b.ctx.jobs.pause();
    const archivist = await a.as('archivist');
    const print = await archivist.post('/api/prints').send(buildPrint());
    const upload = await archivist
      .post(`/api/prints/${print.body.id}/assets`)
      .field('view', 'recto')
      .attach('file', await buildJpeg(320, 240, [90, 120, 150]), 'once.jpg');
    expect(upload.status).toBe(201);
    expect(upload.body.status).toBe('processing');
    const sha256 = upload.body.sha256 as string;
    // Both instances start again and queue what is half-made: the waiting job stays one.
    await a.ctx.images.jobs.resume();
    await b.ctx.images.jobs.resume();
    const jobsFor = () =>
      one<{ n: number; completed: number }>(
        `SELECT COUNT(*) AS n, COUNT(*) FILTER (WHERE state = 'completed') AS completed
           FROM pgboss.job WHERE name = 'image-derivatives' AND singleton_key = '${sha256}'`,
      );
    expect(await jobsFor()).toEqual({ n: 1, completed: 0 });
    await handleJobs(a.ctx);
    await handleJobs(b.ctx);
    const throughB = await signIn(b.app, 'archivist@test.example', TEST_PASSWORD);
    await expect
      .poll(
        async () =>
          (await throughB.get(`/api/prints/${print.body.id}`)).body.assets?.[0]?.status as string,
        POLL,
      )
      .toBe('ready');
    // The asset is ready before its job's handler returns and pg-boss marks it completed.
    await expect.poll(jobsFor, POLL).toEqual({ n: 1, completed: 1 });
  });

  it('runs an import received by one instance on the other, from storage, once', async () => {
    // A takes no jobs: only B can run the import A received.
    await a.ctx.jobs.pause();
    const registrar = await a.as('archivist');
    const started = await registrar
      .post('/api/imports')
      .field('mapping', JSON.stringify(CSV_MAPPING))
      .attach('file', Buffer.from(buildCsv([buildCsvRow(901), buildCsvRow(902)])), 'two.csv');
    expect(started.status).toBe(202);
    const throughB = await signIn(b.app, 'archivist@test.example', TEST_PASSWORD);
    const job = await waitForImport(throughB, started.body.id as number);
    expect(job).toMatchObject({ status: 'done', imported: 2 });
    // The import's row says done before its job ends: pg-boss marks the job completed, and
    // the file is removed, once the handler has returned.
    const jobs = () =>
      one<{ n: number; completed: number }>(
        `SELECT COUNT(*) AS n, COUNT(*) FILTER (WHERE state = 'completed') AS completed
           FROM pgboss.job WHERE name = 'csv-import'`,
      );
    await expect.poll(jobs, POLL).toEqual({ n: 1, completed: 1 });
    // The file waited in storage and went when the import finished.
    await expect
      .poll(() => a.ctx.images.storage.stat(`imports/${started.body.id}.csv`), POLL)
      .toBeNull();
    await handleJobs(a.ctx);
  });

  it('keeps one weekly digest schedule however many instances register it', async () => {
    await scheduleToneDigest(a.ctx);
    await scheduleToneDigest(b.ctx);
    const schedules = await a.ctx.sequelize.query<{ name: string; cron: string }>(
      'SELECT name, cron FROM pgboss.schedule',
      { type: QueryTypes.SELECT },
    );
    expect(schedules).toEqual([{ name: 'tone-digest', cron: '0 7 * * 1' }]);
  });

  it('drops a role change and a sign-out made through one instance from what the other kept', async () => {
    const credentials = { email: 'conservator@test.example', password: TEST_PASSWORD };
    const signedIn = await request(a.app).post('/api/session').send(credentials);
    const cookie = signedIn.headers['set-cookie']![0]!.split(';')[0]!;
    const sessionOn = (app: TestApp) => request(app.app).get('/api/session').set('Cookie', cookie);
    // Both instances read the session and its user once, and keep them.
    expect((await sessionOn(a)).body.user.role).toBe('conservator');
    expect((await sessionOn(b)).body.user.role).toBe('conservator');

    const adminB = await signIn(b.app, 'admin@test.example', TEST_PASSWORD);
    const users = (await adminB.get('/api/users')).body.items as Array<{
      id: number;
      email: string;
    }>;
    const id = users.find((user) => user.email === credentials.email)!.id;
    expect((await adminB.patch(`/api/users/${id}`).send({ role: 'viewer' })).status).toBe(200);
    // Through A, the session no longer acts as a conservator (a new role needs a new sign-in).
    await expect
      .poll(async () => {
        const answer = await sessionOn(a);
        return answer.status === 200 ? answer.body.user.role : answer.status;
      }, POLL)
      .not.toBe('conservator');

    const again = await request(a.app).post('/api/session').send(credentials);
    const fresh = again.headers['set-cookie']![0]!.split(';')[0]!;
    const freshOn = (app: TestApp) => request(app.app).get('/api/session').set('Cookie', fresh);
    expect((await freshOn(b)).status).toBe(200);
    const out = await request(a.app)
      .delete('/api/session')
      .set('Cookie', fresh)
      .set('X-CSRF-Token', again.body.csrfToken as string);
    expect(out.status).toBe(204);
    await expect.poll(async () => (await freshOn(b)).status, POLL).toBe(401);
  });

  it('lets one instance at a time work on one original (upload against delete)', async () => {
    // Two pools stand for two instances: the in-process queue of hash-lock.ts is shared
    // by the apps of this test file, so the database's lock is tested on its own here.
    const key = 'original:' + 'ab'.repeat(32);
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    const order: string[] = [];
    const first = dialectOf(a.ctx.sequelize).exclusiveAcrossInstances(
      a.ctx.sequelize,
      key,
      async () => {
        order.push('first in');
        await held;
        order.push('first out');
      },
    );
    await expect.poll(() => order, POLL).toEqual(['first in']);
    const second = dialectOf(b.ctx.sequelize).exclusiveAcrossInstances(
      b.ctx.sequelize,
      key,
      async () => {
        order.push('second in');
      },
    );
    await expect.poll(() => waitingForLock(false), POLL).toBe(1);
    // Another file is not held up.
    await dialectOf(b.ctx.sequelize).exclusiveAcrossInstances(
      b.ctx.sequelize,
      `${key}-other`,
      async () => {
        order.push('other file');
      },
    );
    release();
    await Promise.all([first, second]);
    expect(order).toEqual(['first in', 'other file', 'first out', 'second in']);
  });

  it("sends a queued message once when both instances' mailers pass over the queue", async () => {
    const to = 'both-passes@example.org';
    await writeTransaction(a.ctx.sequelize, (transaction) =>
      insertQueuedMail(
        {
          recipients: to,
          subject: 'Once',
          textBody: 'Once.',
          htmlBody: '<p>Once.</p>',
          nextAttemptAt: new Date(),
        },
        transaction,
      ),
    );
    a.ctx.mailer.kick();
    b.ctx.mailer.kick();
    await Promise.all([a.ctx.mailer.idle(), b.ctx.mailer.idle()]);
    const delivered = await one<{ n: number }>(
      `SELECT COUNT(*) AS n FROM outbox_messages WHERE recipients LIKE '%${to}%'`,
    );
    expect(delivered.n).toBe(1);
    const queued = await one<{ status: string; attempts: number }>(
      `SELECT status, attempts FROM mail_queue WHERE recipients = '${to}'`,
    );
    expect(queued).toEqual({ status: 'sent', attempts: 1 });
  });
});
