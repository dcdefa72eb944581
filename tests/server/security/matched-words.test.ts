import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';

/** Matched words (the client's highlighting) come only from hits the asker may see. */
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  await archivist
    .post('/api/prints')
    .send(buildPrint({ title: 'Lanternfield barn', process: 'albumen print' }));
  await archivist.post('/api/prints').send(buildPrint({ title: 'Orchard with ricks' }));
});
afterAll(() => t.close());

describe('GET /api/prints matchedWords', () => {
  it('names no word of a print the filters leave out', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/prints?q=lanternfield&process=salt%20print');
    expect(response.body.total).toBe(0);
    expect(response.body.matchedWords).toEqual([]);
  });

  it('names no word of a print that matches only some of the typed words', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/prints?q=lanternfield%20orchard');
    expect(response.body.total).toBe(0);
    expect(response.body.matchedWords).toEqual([]);
  });

  it('names the words of the hits it returns', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/prints?q=lanternfeld');
    expect(response.body.total).toBe(1);
    expect(response.body.matchedWords).toEqual(['lanternfield']);
  });
});
