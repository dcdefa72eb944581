import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  down as oneStoreDown,
  up as oneStoreUp,
} from '../../../server/db/migrations/0015-one-settings-store';
import { settingSources, SETTING_AREAS } from '../../../shared/domain/settings';
import { MESSAGES } from '../../../shared/schemas/messages';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('GET /api/settings', () => {
  it('gives every area at its default, each with the source of that default', async () => {
    for (const role of ['conservator', 'admin'] as const) {
      const response = await (await t.as(role)).get('/api/settings');
      expect(response.status).toBe(200);
      expect(response.body).toMatchObject({
        tone: { watchDE00: 1, noticeableDE00: 2, yellowingB: 2, projectionYears: 5 },
        schedule: { steadyMonths: 24, watchMonths: 12, changingMonths: 6 },
        // 20 sheets of 8×10 in per litre: common practice (Anchell, The Darkroom Cookbook).
        chemistry: { fixerCapacitySheetsPerLitre: 20, sensitiserMlPer8x10: 2 },
      });
      const sources = response.body.sources as Record<string, { source: string }>;
      for (const area of SETTING_AREAS) {
        for (const name of Object.keys(response.body[area])) {
          expect(sources[`${area}.${name}`]?.source, `${area}.${name}`).toMatch(/\w{3}/);
        }
      }
      expect(sources['chemistry.fixerCapacitySheetsPerLitre']).toMatchObject({
        defaultValue: 20,
        source: expect.stringMatching(/^Common practice.*Darkroom Cookbook/),
      });
      expect(sources['tone.watchDE00']!.source).toMatch(/from memory/);
    }
  });

  it('is refused to a curator (403) and to nobody signed in (401)', async () => {
    expectProblem(await (await t.as('curator')).get('/api/settings'), 403);
    expectProblem(await (await t.as('viewer')).get('/api/settings'), 403);
    expectProblem(await t.anonymous().get('/api/settings'), 401);
  });
});

describe('PATCH /api/settings', () => {
  it('lets an admin change a chemistry value, and null puts the default back', async () => {
    const admin = await t.as('admin');
    const changed = await admin
      .patch('/api/settings')
      .send({ chemistry: { sensitiserMlPer8x10: 3 } });
    expect(changed.status).toBe(200);
    expect(changed.body.chemistry.sensitiserMlPer8x10).toBe(3);
    expect((await admin.get('/api/settings')).body.chemistry.sensitiserMlPer8x10).toBe(3);
    const reset = await admin
      .patch('/api/settings')
      .send({ chemistry: { sensitiserMlPer8x10: null } });
    expect(reset.body.chemistry.sensitiserMlPer8x10).toBe(2);
  });

  it('refuses unknown areas and keys with 422 in our own words', async () => {
    const admin = await t.as('admin');
    for (const body of [{ colour: 1 }, { chemistry: { colour: 1 } }, { tone: { colour: 1 } }]) {
      const response = await admin.patch('/api/settings').send(body);
      expectProblem(response, 422);
      const messages = (response.body.errors as Array<{ message: string }>).map((e) => e.message);
      expect(messages).toContain(MESSAGES.unknownField);
    }
    const low = await admin
      .patch('/api/settings')
      .send({ chemistry: { fixerCapacitySheetsPerLitre: 0 } });
    expectProblem(low, 422);
    expect(errorPaths(low)).toEqual(['chemistry.fixerCapacitySheetsPerLitre']);
  });

  it('is refused to every role but admin (403) and to nobody signed in (401)', async () => {
    for (const role of ['viewer', 'curator', 'conservator', 'archivist'] as const) {
      const response = await (
        await t.as(role)
      )
        .patch('/api/settings')
        .send({ chemistry: { sensitiserMlPer8x10: 3 } });
      expectProblem(response, 403);
    }
    expectProblem(await t.anonymous().patch('/api/settings').send({}), 401);
  });

  it('the old chemistry settings path is gone', async () => {
    const admin = await t.as('admin');
    expect((await admin.get('/api/chemistry/settings')).status).toBe(404);
  });
});

describe('migration 0015', () => {
  it('moves a changed chemistry value and the tone watch values into the one store', async () => {
    const qi = t.ctx.sequelize.getQueryInterface();
    // Back to the two tables as they were before 0015, holding changed values.
    await oneStoreDown({ context: qi });
    const now = new Date().toISOString();
    await t.ctx.sequelize.query(
      'INSERT INTO chemistry_settings (key, value, updated_at) VALUES (?, ?, ?), (?, ?, ?)',
      { replacements: ['fixerCapacitySheetsPerLitre', 12.5, now, 'sensitiserMlPer8x10', 4, now] },
    );
    await t.ctx.sequelize.query('DELETE FROM settings WHERE key = ?', {
      replacements: ['tone-watch'],
    });
    await t.ctx.sequelize.query('INSERT INTO settings (key, value, updated_at) VALUES (?, ?, ?)', {
      replacements: [
        'tone-watch',
        JSON.stringify({ tone: { yellowingB: 2.5 }, schedule: { watchMonths: 9 } }),
        now,
      ],
    });

    await oneStoreUp({ context: qi });

    const settings = (await (await t.as('conservator')).get('/api/settings')).body;
    expect(settings.chemistry).toEqual({
      fixerCapacitySheetsPerLitre: 12.5,
      sensitiserMlPer8x10: 4,
    });
    expect(settings.tone.yellowingB).toBe(2.5);
    expect(settings.tone.watchDE00).toBe(1);
    expect(settings.schedule).toEqual({ steadyMonths: 24, watchMonths: 9, changingMonths: 6 });
    expect(await qi.showAllTables()).not.toContain('chemistry_settings');

    // Put the defaults back for the other tests of this file.
    await (await t.as('admin')).patch('/api/settings').send({
      chemistry: { fixerCapacitySheetsPerLitre: null, sensitiserMlPer8x10: null },
      tone: { yellowingB: 2 },
      schedule: { watchMonths: 12 },
    });
  });
});

describe('settingSources', () => {
  it('names a source for every key of every area', () => {
    const sources = settingSources();
    expect(Object.keys(sources).sort()).toEqual(
      [
        'tone.watchDE00',
        'tone.noticeableDE00',
        'tone.fadingDensity',
        'tone.darkeningL',
        'tone.yellowingB',
        'tone.projectionYears',
        'tone.repeatabilityLab',
        'tone.repeatabilityDensity',
        'schedule.steadyMonths',
        'schedule.watchMonths',
        'schedule.changingMonths',
        'chemistry.fixerCapacitySheetsPerLitre',
        'chemistry.sensitiserMlPer8x10',
        'environment.excursionHours',
        'environment.lifeAtReferenceYears',
        'light.saltPrint',
        'light.albumenPrint',
        'light.cyanotype',
        'light.platinumPalladium',
        'light.silverGelatin',
      ].sort(),
    );
  });
});
