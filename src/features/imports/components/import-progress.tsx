import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { importFieldLabel } from '@shared/domain/import-fields';
import type { ImportJobView, ImportPreviewRow } from '@shared/types/imports';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { invalidateCatalogue } from '@/lib/catalogue';
import { failedRowsUrl, importQueries } from '../api/imports-api';
import { failedRowsLinkText, importSummary } from './import-summary';

const ACTION_WORDS: Record<ImportPreviewRow['action'], string> = {
  create: 'will be added',
  update: 'will update the print',
  unchanged: 'already in the catalogue, unchanged',
  invalid: 'has problems',
};

/** An import's progress bar and, when it ends, what happened to every row. Survives a reload: it reads the job from the server. */
export function ImportProgress({
  id,
  children,
}: {
  id: number;
  children?: (job: ImportJobView) => React.ReactNode;
}) {
  const job = useQuery(importQueries.detail(id));
  const queryClient = useQueryClient();
  const finished = job.data?.status === 'done' && !job.data.dryRun;
  useEffect(() => {
    // The catalogue changed under every cached list and record.
    if (finished) void invalidateCatalogue(queryClient);
  }, [finished, queryClient]);
  if (job.isPending) return <Loading label="Loading the import…" />;
  if (job.error) return <ErrorNotice error={job.error} />;
  const data = job.data;
  const running = data.status === 'queued' || data.status === 'running';
  const percent = data.rows ? Math.round((data.processed / data.rows) * 100) : 0;
  return (
    <section aria-labelledby="import-progress" className="space-y-4">
      <h2 id="import-progress" className="text-xl">
        {data.dryRun ? 'Check' : 'Import'} of {data.fileName ?? 'the file'}
      </h2>
      <div>
        <div
          role="progressbar"
          aria-label={data.dryRun ? 'Checking rows' : 'Importing rows'}
          aria-valuemin={0}
          aria-valuemax={data.rows}
          aria-valuenow={data.processed}
          aria-valuetext={`${data.processed} of ${data.rows} rows`}
          className="h-3 w-full overflow-hidden rounded-full border border-paper-edge bg-paper-deep"
        >
          <div className="h-full bg-gall transition-all" style={{ width: `${percent}%` }} />
        </div>
        <p className="mt-1 text-sm text-ink-soft" aria-live="polite">
          {running
            ? `${data.processed} of ${data.rows} rows…`
            : `${data.rows} rows read (${data.encoding}).`}
        </p>
      </div>
      {data.status === 'failed' && (
        <p role="alert" className="text-alert">
          The import stopped: {data.error}
        </p>
      )}
      {data.status === 'done' && <Summary job={data} />}
      {data.status === 'done' && children?.(data)}
      {data.status === 'done' && data.dryRun && <PreviewTable rows={data.preview} />}
      {data.status === 'done' && !data.dryRun && data.failed.length > 0 && (
        <FailedTable job={data} />
      )}
    </section>
  );
}

function Summary({ job }: { job: ImportJobView }) {
  return (
    <p role="status" className="rounded border border-paper-edge bg-white/60 px-3 py-2 text-sm">
      {importSummary(job)}
    </p>
  );
}

function Problems({ errors }: { errors: ImportJobView['failed'][number]['errors'] }) {
  return (
    <ul className="list-disc pl-4">
      {errors.map((error, index) => (
        <li key={index}>
          <span className="font-medium">{importFieldLabel(error.field)}</span>: {error.message}
        </li>
      ))}
    </ul>
  );
}

/** Good rows listed below the bad ones; the rest are counted, not listed. */
const GOOD_ROWS_SHOWN = 20;

function PreviewTable({ rows }: { rows: ImportPreviewRow[] }) {
  const bad = rows.filter((row) => row.action === 'invalid');
  const good = rows.filter((row) => row.action !== 'invalid');
  const shown = [...bad, ...good.slice(0, GOOD_ROWS_SHOWN)];
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <caption className="mb-2 text-left text-ink-soft">
          Rows with problems first, then the others (row 1 is the header).
        </caption>
        <thead>
          <tr className="border-b border-paper-edge text-left">
            <th scope="col" className="py-1 pr-3">
              Row
            </th>
            <th scope="col" className="py-1 pr-3">
              Accession number
            </th>
            <th scope="col" className="py-1 pr-3">
              Title
            </th>
            <th scope="col" className="py-1">
              What happens
            </th>
          </tr>
        </thead>
        <tbody>
          {shown.map((row) => (
            <tr
              key={row.row}
              className={
                row.action === 'invalid' ? 'bg-alert-light/60' : 'border-b border-paper-edge/60'
              }
            >
              <td className="py-1 pr-3 font-mono">{row.row}</td>
              <td className="py-1 pr-3 font-mono">{row.accessionNumber ?? '—'}</td>
              <td className="py-1 pr-3">{row.title || '—'}</td>
              <td className="py-1">
                {row.action === 'invalid' ? (
                  <Problems errors={row.errors} />
                ) : (
                  ACTION_WORDS[row.action]
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {good.length > GOOD_ROWS_SHOWN && (
        <p className="mt-1 text-sm text-ink-faint">
          …and {good.length - GOOD_ROWS_SHOWN} more rows without problems.
        </p>
      )}
    </div>
  );
}

function FailedTable({ job }: { job: ImportJobView }) {
  return (
    <div className="space-y-2">
      <h3 className="text-lg">Rows not imported</h3>
      <p className="text-sm">
        <a href={failedRowsUrl(job.id)} download className="underline">
          {failedRowsLinkText(job.failed.length)}
        </a>{' '}
        — the same columns and a <code>problems</code> column; fix them and import the file again.
      </p>
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr className="border-b border-paper-edge text-left">
            <th scope="col" className="py-1 pr-3">
              Row
            </th>
            <th scope="col" className="py-1">
              Problems
            </th>
          </tr>
        </thead>
        <tbody>
          {job.failed.map((failure) => (
            <tr key={failure.row} className="border-b border-paper-edge/60">
              <td className="py-1 pr-3 font-mono">{failure.row}</td>
              <td className="py-1">
                <Problems errors={failure.errors} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
