import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { readHeaders, readRecords } from '../../../../server/services/imports/csv-source';

const dir = mkdtempSync(join(tmpdir(), 'printwarden-csv-source-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function fileOf(name: string, text: string): string {
  const path = join(dir, name);
  writeFileSync(path, text);
  return path;
}

async function all(path: string): Promise<string[][]> {
  const records: string[][] = [];
  for await (const record of readRecords(path, 'utf-8')) records.push(record);
  return records;
}

describe('readRecords', () => {
  it('reads a file of many read-stream chunks record by record, quoted newlines across chunk edges included', async () => {
    // 20,000 rows of about 60 bytes: some 1.2 MB, so many 64 KiB chunks; every 97th title
    // holds a quoted line break and a doubled quote. Chunk edges fall mid-record.
    const rows = Array.from({ length: 20_000 }, (_, i) => [
      `IMP.${i}`,
      i % 97 === 0 ? `Line one\r\nline "two" of ${i}` : `Print ${i}`,
      'salt print',
    ]);
    const quote = (cell: string) =>
      /[",\r\n]/.test(cell) ? `"${cell.replace(/"/g, '""')}"` : cell;
    const text = [['No.', 'Title', 'Process'], ...rows]
      .map((row) => row.map(quote).join(','))
      .join('\r\n');
    const records = await all(fileOf('many.csv', `${text}\r\n`));
    expect(records).toHaveLength(rows.length + 1);
    // Line breaks inside quoted cells come back as LF, as a form's text area stores them.
    expect(records.slice(1)).toEqual(
      rows.map((row) => row.map((cell) => cell.replace(/\r\n/g, '\n'))),
    );
  });

  it('reads rows whose line ends differ (CRLF, LF and a lone CR mixed), none run together', async () => {
    const path = fileOf(
      'mixed.csv',
      'No.,Title\r\nA.1,First\r\nA.2,Second\nA.3,Third\nA.4,"Two\r\nlines"\rA.5,Fifth\r\n',
    );
    expect(await all(path)).toEqual([
      ['No.', 'Title'],
      ['A.1', 'First'],
      ['A.2', 'Second'],
      ['A.3', 'Third'],
      ['A.4', 'Two\nlines'],
      ['A.5', 'Fifth'],
    ]);
  });

  it('keeps a last record with no line end, skips blank lines, and guesses a semicolon delimiter', async () => {
    const path = fileOf('semicolon.csv', 'No.;Title\r\n\r\nA.1;First\r\n  \r\nA.2;Second');
    expect(await all(path)).toEqual([
      ['No.', 'Title'],
      ['A.1', 'First'],
      ['A.2', 'Second'],
    ]);
    expect(await readHeaders(path, 'utf-8')).toEqual(['No.', 'Title']);
  });

  it('reads nothing from an empty file', async () => {
    expect(await all(fileOf('empty.csv', ''))).toEqual([]);
    expect(await readHeaders(join(dir, 'empty.csv'), 'utf-8')).toBeNull();
  });
});
