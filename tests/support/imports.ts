import { expect } from 'vitest';
import type { SignedIn } from './test-app';

/** Column names of the spreadsheet the import tests and the demo use. */
export const CSV_HEADERS = [
  'Accession no.',
  'Title',
  'Process',
  'Maker',
  'Date made',
  'Fixing (min)',
  'Washing (min)',
  'Description',
];

/** The mapping of those columns (column → field). */
export const CSV_MAPPING = {
  'Accession no.': 'accessionNumber',
  Title: 'title',
  Process: 'process',
  Maker: 'maker',
  'Date made': 'madeOn',
  'Fixing (min)': 'fixingMinutes',
  'Washing (min)': 'washingMinutes',
  Description: 'description',
};

const quote = (cell: string) => (/[",\n\r]/.test(cell) ? `"${cell.replace(/"/g, '""')}"` : cell);

/** A CSV text (CRLF line ends, as spreadsheets write) from rows of cells. */
export function buildCsv(rows: string[][], headers = CSV_HEADERS): string {
  return [headers, ...rows].map((row) => row.map(quote).join(',')).join('\r\n') + '\r\n';
}

/** A good row with accession number `2019.0${n}`-style numbering. */
export function buildCsvRow(n: number, overrides: Partial<Record<string, string>> = {}): string[] {
  const row: Record<string, string> = {
    'Accession no.': `IMP.${String(n).padStart(5, '0')}`,
    Title: `Imported print ${n}`,
    Process: 'salt print',
    Maker: 'Mill Lane darkroom',
    'Date made': '2019',
    'Fixing (min)': '12',
    'Washing (min)': '20',
    Description: '',
    ...overrides,
  };
  return CSV_HEADERS.map((header) => row[header]!);
}

/** Starts an import (or a dry run) of `csv` and waits until it has finished. */
export async function importCsv(
  agent: SignedIn,
  csv: string | Buffer,
  options: { dryRun?: boolean; mapping?: object; name?: string; encoding?: string } = {},
) {
  const query = new URLSearchParams();
  if (options.dryRun) query.set('dryRun', '1');
  if (options.encoding) query.set('encoding', options.encoding);
  const started = await agent
    .post(`/api/imports${query.size ? `?${query}` : ''}`)
    .field('mapping', JSON.stringify(options.mapping ?? CSV_MAPPING))
    .attach(
      'file',
      Buffer.isBuffer(csv) ? csv : Buffer.from(csv, 'utf8'),
      options.name ?? 'prints.csv',
    );
  expect(started.status, JSON.stringify(started.body)).toBe(202);
  return waitForImport(agent, started.body.id);
}

export async function waitForImport(agent: SignedIn, id: number) {
  for (let attempt = 0; attempt < 600; attempt += 1) {
    const response = await agent.get(`/api/imports/${id}`);
    expect(response.status).toBe(200);
    if (response.body.status === 'done' || response.body.status === 'failed') return response.body;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error(`import ${id} did not finish`);
}
