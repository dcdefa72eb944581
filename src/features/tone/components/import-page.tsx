import { formatCount, formatDate } from '@shared/domain/format';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { ImportResult } from '@shared/types/tone';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useImportToneChecks } from '../api/tone-mutations';

/** A CGATS.17 file from the instrument: previewed first, then imported as checks. */
export function ImportPage() {
  const [file, setFile] = useState<File | null>(null);
  const [preview, setPreview] = useState<ImportResult | null>(null);
  const [done, setDone] = useState<ImportResult | null>(null);
  const upload = useImportToneChecks();
  const choose = (chosen: File | null) => {
    setFile(chosen);
    setPreview(null);
    setDone(null);
    upload.reset();
    if (chosen) upload.mutate({ file: chosen, dryRun: true }, { onSuccess: setPreview });
  };
  const lineErrors = upload.error instanceof ApiError ? upload.error.errors : [];
  return (
    <>
      <PageHeader title="Import measurements" eyebrow="Tone watch" />
      <p className="mb-3 max-w-prose text-sm text-ink-soft">
        A CGATS.17 (ISO 28178) ASCII file whose rows name <code>SAMPLE_NAME</code> (or{' '}
        <code>SAMPLE_ID</code>) as <code>accession number/patch</code>, with <code>LAB_L</code>,{' '}
        <code>LAB_A</code>, <code>LAB_B</code> (D50/2°); optional <code>checkedOn</code>,{' '}
        <code>method</code> and <code>instrument</code> fields, else the file's <code>CREATED</code>{' '}
        date. Nothing is saved until you confirm the preview.
      </p>
      <div
        className="mb-4 rounded border-2 border-dashed border-paper-edge p-6 text-center"
        onDragOver={(e) => e.preventDefault()}
        onDrop={(e) => {
          e.preventDefault();
          choose(e.dataTransfer.files[0] ?? null);
        }}
      >
        <label className="cursor-pointer text-sm">
          <span className="font-semibold">Choose a measurement file</span> or drop it here
          <input
            type="file"
            accept=".txt,.cgats,.cgt,.it8,text/plain"
            className="sr-only"
            onChange={(e) => choose(e.target.files?.[0] ?? null)}
          />
        </label>
        {file && <p className="mt-1 text-xs text-ink-faint">{file.name}</p>}
      </div>
      {upload.isPending && (
        <p role="status" className="text-sm">
          Reading the file…
        </p>
      )}
      {lineErrors.length > 0 ? (
        <div
          role="alert"
          className="rounded border border-alert bg-alert-light px-3 py-2 text-sm text-alert"
        >
          The file cannot be read: {lineErrors.map((e) => e.message).join('; ')}
        </div>
      ) : (
        <ErrorNotice error={upload.error} />
      )}
      {(done ?? preview) && <ImportSummary result={(done ?? preview)!} />}
      {preview && !done && preview.checks.length > 0 && (
        <Button
          tone="primary"
          className="mt-3"
          disabled={upload.isPending}
          onClick={() => file && upload.mutate({ file, dryRun: false }, { onSuccess: setDone })}
        >
          Import {formatCount(preview.checks.length, 'check')}
        </Button>
      )}
    </>
  );
}

function ImportSummary({ result }: { result: ImportResult }) {
  return (
    <section aria-label={result.dryRun ? 'Preview' : 'Imported'} className="space-y-3 text-sm">
      <h2 className="text-lg">
        {result.dryRun
          ? `Preview: ${formatCount(result.checks.length, 'check')} would be created`
          : `Imported ${formatCount(result.created, 'check')}`}
      </h2>
      {result.warnings.length > 0 && (
        <ul
          aria-label="Already stored"
          className="rounded border border-gall bg-gall-light px-3 py-2"
        >
          {result.warnings.map((warning) => (
            <li key={warning}>{warning}</li>
          ))}
        </ul>
      )}
      <ul className="divide-y divide-paper-edge">
        {result.checks.map((check, i) => (
          <li key={`${check.printId}-${check.checkedOn}-${i}`} className="py-1">
            <Link to={paths.print(check.printId)} className="font-mono">
              {check.accessionNumber}
            </Link>{' '}
            · {formatDate(check.checkedOn, true)} · {check.patches.join(', ')}
          </li>
        ))}
      </ul>
      {result.skipped.length > 0 && (
        <>
          <h3 className="font-semibold">{formatCount(result.skipped.length, 'row')} skipped</h3>
          <ul className="list-disc pl-5">
            {result.skipped.map((skip) => (
              <li key={`${skip.row}-${skip.reason}`}>
                Line {skip.row}: {skip.reason}
              </li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}
