import { formatCount } from '@shared/domain/format';
import type { ImportJobView } from '@shared/types/imports';

type Counts = Pick<ImportJobView, 'dryRun' | 'rows' | 'imported' | 'updated' | 'unchanged'> & {
  failed: unknown[];
};

/** The one line under a finished import or check, each noun in the number its count calls for. */
export function importSummary(job: Counts): string {
  const failed = job.failed.length;
  if (job.dryRun) {
    const valid = job.rows - failed;
    return `${valid} of ${formatCount(job.rows, 'row')} ${valid === 1 ? 'is' : 'are'} ready to import; ${failed} ${failed === 1 ? 'has' : 'have'} problems. Nothing has been written yet.`;
  }
  return `${formatCount(job.imported, 'print')} added, ${job.updated} updated, ${job.unchanged} unchanged; ${formatCount(failed, 'row')} not imported.`;
}

/** "Download the 3 rows not imported (CSV)", "… the row not imported …" for one. */
export function failedRowsLinkText(failed: number): string {
  return failed === 1
    ? 'Download the row not imported (CSV)'
    : `Download the ${failed} rows not imported (CSV)`;
}

/** "Import the 497 good rows" after a check; "Import the good row" when only one is. */
export function importGoodRowsLabel(good: number): string {
  return good === 1 ? 'Import the good row' : `Import the ${good} good rows`;
}
