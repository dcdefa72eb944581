import { describe, expect, it } from 'vitest';
import {
  failedRowsLinkText,
  importGoodRowsLabel,
  importSummary,
} from '../../../../src/features/imports/components/import-summary';

const job = { dryRun: false, rows: 6, imported: 5, updated: 0, unchanged: 0, failed: [{}] };

describe('the summary of a finished import', () => {
  it('puts each noun in the number its count calls for', () => {
    expect(importSummary(job)).toBe('5 prints added, 0 updated, 0 unchanged; 1 row not imported.');
    expect(importSummary({ ...job, imported: 1, failed: [{}, {}, {}] })).toBe(
      '1 print added, 0 updated, 0 unchanged; 3 rows not imported.',
    );
    expect(importSummary({ ...job, imported: 497, failed: [{}, {}, {}] })).toBe(
      '497 prints added, 0 updated, 0 unchanged; 3 rows not imported.',
    );
  });

  it('says how many rows of a check are ready and how many have problems', () => {
    expect(importSummary({ ...job, dryRun: true })).toBe(
      '5 of 6 rows are ready to import; 1 has problems. Nothing has been written yet.',
    );
    expect(importSummary({ ...job, dryRun: true, rows: 3, failed: [{}, {}] })).toBe(
      '1 of 3 rows is ready to import; 2 have problems. Nothing has been written yet.',
    );
  });

  it('names one failed row in the singular in the download link', () => {
    expect(failedRowsLinkText(1)).toBe('Download the row not imported (CSV)');
    expect(failedRowsLinkText(3)).toBe('Download the 3 rows not imported (CSV)');
  });

  it('names one good row in the singular on the import button', () => {
    expect(importGoodRowsLabel(1)).toBe('Import the good row');
    expect(importGoodRowsLabel(497)).toBe('Import the 497 good rows');
  });
});
