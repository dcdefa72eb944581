import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sendToneDigest } from '../../../server/services/tone/digest';
import { buildLoggerCsv } from '../../support/environment';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let place: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  place = (await archivist.post('/api/locations').send({ code: 'DIG-1', name: 'Basement press' }))
    .body.id;
});
afterAll(() => t.close());

/** Hours 24–95 at 62 % RH: a stretch of 71 hours above the 50 % band. */
const damp = (start: string) =>
  Buffer.from(
    buildLoggerCsv({
      start,
      days: 5,
      climate: (i) => [17, i >= 24 && i < 96 ? 62 : 45],
    }),
  );

describe('places outside their band', () => {
  it('the set time comes from the settings: at 100 hours a 71-hour stretch opens nothing', async () => {
    const admin = await t.as('admin');
    const patch = await admin.patch('/api/settings').send({ environment: { excursionHours: 100 } });
    expect(patch.status).toBe(200);
    expect(patch.body.environment.excursionHours).toBe(100);
    const conservator = await t.as('conservator');
    const upload = await conservator
      .post(`/api/locations/${place}/readings`)
      .attach('file', damp('2026-04-01'), 'a.csv');
    expect(upload.body).toMatchObject({ accepted: 120, alertsOpened: 0 });
    await admin.patch('/api/settings').send({ environment: { excursionHours: 48 } });
  });

  it('at 48 hours it opens an alert, and the weekly digest names the place', async () => {
    const conservator = await t.as('conservator');
    const upload = await conservator
      .post(`/api/locations/${place}/readings`)
      .attach('file', damp('2026-06-01'), 'b.csv');
    expect(upload.body.alertsOpened).toBe(1);
    const result = await sendToneDigest(t.ctx, new Date('2026-06-08T07:00:00Z'));
    expect(result.placeAlerts).toBe(1);
    await t.ctx.mailer.idle();
    const outbox = await (await t.as('admin')).get('/api/outbox');
    const digest = outbox.body.messages.find((m: { subject: string }) =>
      m.subject.startsWith('Printwarden tone watch'),
    );
    expect(digest.subject).toMatch(/1 place alert$/);
    expect(digest.text).toContain('Places outside their storage band (1):');
    expect(digest.text).toMatch(/- DIG-1 Basement press: Basement press was damper than its band/);
  });
});
