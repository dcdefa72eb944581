import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildDigest } from '../../../server/services/tone/digest-message';
import { sendToneDigest } from '../../../server/services/tone/digest';
import { buildPrint, buildSaltSteps } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';
import { buildReadings, buildToneCheck } from '../../support/tone-factories';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('the weekly digest', () => {
  it('builds a message naming new alerts and checks due, overdue marked', () => {
    const message = buildDigest({
      today: '2026-12-07',
      appUrl: 'http://localhost:3000',
      alerts: [
        {
          id: 1,
          print: { id: 1, accessionNumber: '2024.0008', title: 'Wool <store>' },
          kind: 'yellowing',
          reason: 'Tone now yellowing (was on watch): bare paper b* +3.2 since 2024-05-25',
          openedAt: '2026-12-01T07:00:00.000Z',
          acknowledgedAt: null,
          acknowledgedBy: null,
        },
      ],
      due: [
        {
          accessionNumber: '2020.0002',
          title: 'Weir',
          nextCheckDue: '2026-11-09',
          status: 'yellowing',
        },
      ],
    });
    expect(message.subject).toBe('Printwarden tone watch: 1 new alert, 1 check due');
    expect(message.text).toContain('- 2024.0008 Wool <store>: Tone now yellowing (was on watch)');
    expect(message.text).toContain('- 2020.0002 Weir: due 2026-11-09 (overdue), yellowing');
    expect(message.html).toContain('Wool &lt;store&gt;');
  });

  it('arrives in the outbox of every conservator, with the status-change alert', async () => {
    const archivist = await t.as('archivist');
    const print = await archivist.post('/api/prints').send(
      buildPrint({
        title: 'Digest print',
        madeOn: '2023',
        processing: buildSaltSteps({ washing: 3 }),
      }),
    );
    const conservator = await t.as('conservator');
    const url = `/api/prints/${print.body.id}/tone-checks`;
    await conservator.post(url).send(buildToneCheck({ checkedOn: '2024-03-02', baseline: true }));
    await conservator
      .post(url)
      .send(buildToneCheck({ checkedOn: '2025-03-02', readings: buildReadings({ dminB: 4.6 }) }));
    await conservator
      .post(url)
      .send(buildToneCheck({ checkedOn: '2026-03-02', readings: buildReadings({ dminB: 7.4 }) }));
    const result = await sendToneDigest(t.ctx, new Date('2026-12-07T07:00:00Z'));
    expect(result.sent).toBe(1);
    await t.ctx.mailer.idle();
    const outbox = await (await t.as('admin')).get('/api/outbox');
    const digest = outbox.body.messages.find((m: { subject: string }) =>
      m.subject.startsWith('Printwarden tone watch'),
    );
    expect(digest.to).toContain('conservator@test.example');
    expect(digest.text).toMatch(/Digest print: Tone now yellowing \(was (steady|on watch)\)/);
    // Overdue by 2026-12-07 (due 2026-09-02): the digest opened a check-overdue alert too.
    expect(digest.text).toMatch(/due 2026-09-02 \(overdue\)/);
    const alerts = await conservator.get('/api/alerts');
    expect(alerts.body.items.map((a: { kind: string }) => a.kind)).toContain('check-overdue');
  });
});
