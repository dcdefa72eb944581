import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const solution = (query: string) => `/api/chemistry/solution?${query}`;

describe('GET /api/chemistry/solution', () => {
  // 12 g for 100 ml of a 12 % sensitiser (common practice); 169.87 g/mol (IUPAC 2007).
  it('gives grams, molar mass, molarity and cautions to a viewer', async () => {
    const response = await (
      await t.as('viewer')
    ).get(solution('chemical=silver%20nitrate&percent=12&volumeMl=100'));
    expect(response.status).toBe(200);
    expect(response.body.grams).toBeCloseTo(12, 10);
    expect(response.body.molarMass).toBeCloseTo(169.87, 2);
    expect(response.body.molarity).toBeCloseTo(0.7064, 3);
    const cautions = (response.body.cautions as string[]).join(' ');
    expect(cautions).toMatch(
      /Silver nitrate: corrosive.*eye damage.*stains skin.*oxidiser.*aquatic/,
    );
    expect(cautions).toMatch(/gloves and eye protection/i);
    expect(cautions).toMatch(/out of drains/);
    expect(cautions).toMatch(/does not replace.*safety data sheet.*local regulations.*licensed/);
  });

  it('knows the pentahydrate (248.18 g/mol, the issue’s value)', async () => {
    const response = await (
      await t.as('archivist')
    ).get(solution('chemical=sodium%20thiosulfate%20pentahydrate&percent=15&volumeMl=1000'));
    expect(response.body.molarMass).toBeCloseTo(248.18, 2);
    expect(response.body.grams).toBeCloseTo(150, 10);
  });

  // CRC Handbook, aqueous solubility at 20 °C (from memory): NaCl 35.9 g/100 g water, about
  // 31.6 g per 100 ml of saturated brine; 40 % w/v cannot dissolve.
  it('warns when the strength is above what water dissolves, and not at a working strength', async () => {
    const viewer = await t.as('viewer');
    const salty = await viewer.get(solution('chemical=sodium%20chloride&percent=40&volumeMl=100'));
    expect(salty.status).toBe(200);
    expect(salty.body.warnings).toHaveLength(1);
    expect(salty.body.warnings[0].message).toMatch(/more sodium chloride than water dissolves/);
    expect(salty.body.warnings[0].limitPercent).toBeCloseTo(31.6, 1);
    const usual = await viewer.get(solution('chemical=sodium%20chloride&percent=2&volumeMl=100'));
    expect(usual.body.warnings).toEqual([]);
  });

  it('refuses an unknown chemical or a value out of range with 422, and no session with 401', async () => {
    const viewer = await t.as('viewer');
    const unknown = await viewer.get(solution('chemical=mercury&percent=2&volumeMl=100'));
    expectProblem(unknown, 422);
    expect(errorPaths(unknown)).toEqual(['chemical']);
    const range = await viewer.get(solution('chemical=sodium%20chloride&percent=0&volumeMl=-5'));
    expectProblem(range, 422);
    expect(errorPaths(range).sort()).toEqual(['percent', 'volumeMl']);
    expectProblem(await viewer.get(solution('chemical=sodium%20chloride')), 422);
    expectProblem(
      await t.anonymous().get(solution('chemical=sodium%20chloride&percent=2&volumeMl=100')),
      401,
    );
  });
});

describe('POST /api/solution-batches: kind and chemical', () => {
  // Sodium thiosulfate is a fixer (common practice): a "sensitiser" of it is a slip.
  it('refuses a batch whose kind does not fit its chemical, on create and on change', async () => {
    const archivist = await t.as('archivist');
    const wrong = await archivist
      .post('/api/solution-batches')
      .send({ code: 'ST-1', kind: 'sensitiser', chemical: 'sodium thiosulfate' });
    expectProblem(wrong, 422);
    expect(errorPaths(wrong)).toEqual(['kind']);
    expect(wrong.body.errors[0].message).toMatch(/fixer, not a sensitiser/);
    const right = await archivist
      .post('/api/solution-batches')
      .send({ code: 'ST-2', kind: 'fixer', chemical: 'sodium thiosulfate' });
    expect(right.status).toBe(201);
    const changed = await archivist
      .patch(`/api/solution-batches/${right.body.id}`)
      .send({ kind: 'sensitiser' });
    expectProblem(changed, 422);
    const other = await archivist
      .post('/api/solution-batches')
      .send({ code: 'ST-3', kind: 'toner', chemical: 'selenium toner' });
    expect(other.status).toBe(201);
  });
});
