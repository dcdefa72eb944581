import { openSync, readSync, writeSync, closeSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixityCheck } from '../../../server/models';
import { BackgroundWork } from '../../../server/services/background';
import { runFixityCheck, startFixityCheck } from '../../../server/services/fixity/run-fixity';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
const ids: number[] = [];
const shas: string[] = [];

beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  const printId = (await archivist.post('/api/prints').send(buildPrint())).body.id;
  for (const [i, rgb] of (
    [
      [120, 80, 60],
      [200, 190, 170],
      [60, 40, 30],
    ] as const
  ).entries()) {
    const response = await archivist
      .post(`/api/prints/${printId}/assets`)
      .field('view', 'detail')
      .attach('file', await buildJpeg(400, 300, [...rgb]), `d${i}.jpg`);
    ids.push(response.body.id);
    shas.push(response.body.sha256);
  }
  await t.ctx.images.jobs.idle();
});
afterAll(() => t.close());

const storedPath = (sha: string) =>
  join(t.ctx.config.uploadsDir, 'originals', sha.slice(0, 2), sha.slice(2, 4), sha);

async function runToEnd(): Promise<Record<string, unknown>> {
  const admin = await t.as('admin');
  const started = await admin.post('/api/fixity-checks');
  expect(started.status).toBe(202);
  for (let i = 0; i < 100; i += 1) {
    const progress = await admin.get(`/api/fixity-checks/${started.body.id}`);
    if (progress.body.status !== 'running') return progress.body;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error('fixity check did not finish');
}

describe('fixity checks', () => {
  it('finds every original intact, then catches one flipped byte and a missing file', async () => {
    expect(await runToEnd()).toMatchObject({
      status: 'done',
      checked: 3,
      total: 3,
      mismatches: [],
      missing: [],
    });

    // Flip one bit of one byte in the middle of the first original.
    const file = storedPath(shas[0]!);
    const fd = openSync(file, 'r+');
    const byte = Buffer.alloc(1);
    readSync(fd, byte, 0, 1, 200);
    byte[0] = byte[0]! ^ 0x01;
    writeSync(fd, byte, 0, 1, 200);
    closeSync(fd);
    rmSync(storedPath(shas[2]!));

    const report = await runToEnd();
    expect(report).toMatchObject({ status: 'done', checked: 3, missing: [ids[2]] });
    expect(report.mismatches).toEqual([
      { assetId: ids[0], expected: shas[0], actual: expect.stringMatching(/^[0-9a-f]{64}$/) },
    ]);
    expect((report.mismatches as Array<{ actual: string }>)[0]!.actual).not.toBe(shas[0]);

    const record = await (await t.as('viewer')).get(`/api/assets/${ids[1]}/thumbnail`);
    expect(record.status).toBe(200);
    const print = await (
      await t.as('admin')
    ).get(`/api/prints/${(await (await t.as('admin')).get('/api/prints')).body.items[0].id}`);
    const results = Object.fromEntries(
      print.body.assets.map((a: { id: number; fixity: { result: string } }) => [
        a.id,
        a.fixity.result,
      ]),
    );
    expect(results).toEqual({ [ids[0]!]: 'mismatch', [ids[1]!]: 'ok', [ids[2]!]: 'missing' });
  });

  it('is for admins only: 403 for archivists, 401 without a session, 404 and 422 for bad ids', async () => {
    expectProblem(await (await t.as('archivist')).post('/api/fixity-checks'), 403);
    expectProblem(await (await t.as('conservator')).get('/api/fixity-checks/1'), 403);
    expectProblem(await t.anonymous().post('/api/fixity-checks'), 401);
    expectProblem(await t.anonymous().get('/api/fixity-checks/1'), 401);
    const admin = await t.as('admin');
    expectProblem(await admin.get('/api/fixity-checks/999999'), 404);
    expectProblem(await admin.get('/api/fixity-checks/zero'), 422);
    expect((await admin.get('/api/fixity-checks')).body.items.length).toBeGreaterThan(0);
  });

  it('a run cut short by shutdown ends as failed, so it does not block the next run', async () => {
    const background = new BackgroundWork();
    await background.stop(0); // shutdown has begun
    const fixity = { sequelize: t.ctx.sequelize, storage: t.ctx.images.storage, background };
    const check = await startFixityCheck(fixity, null);
    const ended = await runFixityCheck(fixity, check);
    expect(ended.status).toBe('failed');
    expect(ended.checked).toBe(0);
    expect(await FixityCheck.count({ where: { status: 'running' } })).toBe(0);
  });
});
