import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addDays } from '../../../shared/domain/tone/dates';
import { buildPrint } from '../../support/factories';
import { buildCsv, buildCsvRow, importCsv } from '../../support/imports';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
const today = new Date().toISOString().slice(0, 10);
const tomorrow = addDays(today, 1);
const nextYear = String(Number(today.slice(0, 4)) + 1);

beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('the date a print was made', () => {
  it('refuses a print made after today, whether by day or by year (422)', async () => {
    const archivist = await t.as('archivist');
    for (const madeOn of [tomorrow, nextYear, `${nextYear}–${Number(nextYear) + 2}`]) {
      const response = await archivist.post('/api/prints').send(buildPrint({ madeOn }));
      expectProblem(response, 422);
      expect(errorPaths(response)).toEqual(['madeOn']);
      expect(response.body.errors[0].message).toMatch(/cannot be in the future/);
    }
  });

  it('allows today, and an approximate date whose range only reaches past today', async () => {
    const archivist = await t.as('archivist');
    const year = today.slice(0, 4);
    for (const madeOn of [today, year, `c. ${year}`, `${Number(year) - 1}–${nextYear}`]) {
      const response = await archivist.post('/api/prints').send(buildPrint({ madeOn }));
      expect(response.status, madeOn).toBe(201);
    }
  });

  it('says a day that does not exist is not a date, in the problem details (422)', async () => {
    const archivist = await t.as('archivist');
    const response = await archivist.post('/api/prints').send(buildPrint({ madeOn: '2024-02-31' }));
    expectProblem(response, 422);
    expect(errorPaths(response)).toEqual(['madeOn']);
    expect(response.body.errors[0].message).toBe(
      '2024-02-31 is not a date: February 2024 has 29 days.',
    );
  });

  it('refuses the same when a print is edited', async () => {
    const archivist = await t.as('archivist');
    const made = await archivist.post('/api/prints').send(buildPrint({ madeOn: '2024' }));
    const edited = await archivist.patch(`/api/prints/${made.body.id}`).send({ madeOn: tomorrow });
    expectProblem(edited, 422);
    expect(errorPaths(edited)).toContain('madeOn');
  });

  it('lists an imported row made in the future as not imported', async () => {
    const archivist = await t.as('archivist');
    const job = await importCsv(
      archivist,
      buildCsv([buildCsvRow(901), buildCsvRow(902, { 'Date made': nextYear })]),
    );
    expect(job).toMatchObject({ status: 'done', imported: 1 });
    expect(job.failed.map((failure: { row: number }) => failure.row)).toEqual([3]);
    expect(job.failed[0].errors[0].message).toMatch(/cannot be in the future/);
  });
});
