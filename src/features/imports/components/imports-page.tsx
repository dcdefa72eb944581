import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { REQUIRED_IMPORT_FIELDS } from '@shared/domain/import-fields';
import {
  IMPORT_ENCODING_LABELS,
  IMPORT_ENCODINGS,
  type ImportEncoding,
} from '@shared/domain/text-encoding';
import type { ImportInspection } from '@shared/types/imports';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { useInspectCsv, useStartImport } from '../api/imports-api';
import { ImportProgress } from './import-progress';
import { importGoodRowsLabel } from './import-summary';
import { MappingTable } from './mapping-table';

/**
 * Bring prints in from a spreadsheet: choose the file, map its columns, check every row,
 * then import. The job's id sits in the address (`?job=`), so its progress survives a reload.
 */
export function ImportsPage() {
  const [params, setParams] = useSearchParams();
  const jobId = Number(params.get('job')) || null;
  const [file, setFile] = useState<File | null>(null);
  const [inspection, setInspection] = useState<ImportInspection | null>(null);
  const [mapping, setMapping] = useState<Record<string, string>>({});
  const [encoding, setEncoding] = useState<ImportEncoding>('auto');
  const inspect = useInspectCsv();
  const start = useStartImport();

  const read = (chosen: File | null, as: ImportEncoding) => {
    setFile(chosen);
    setInspection(null);
    setParams({});
    if (!chosen) return;
    inspect.mutate(
      { file: chosen, encoding: as },
      {
        onSuccess: (result) => {
          setInspection(result);
          setMapping(result.mapping);
        },
      },
    );
  };
  const choose = (chosen: File | null) => read(chosen, encoding);
  const chooseEncoding = (next: ImportEncoding) => {
    setEncoding(next);
    read(file, next);
  };
  const run = (dryRun: boolean) => {
    if (!file) return;
    start.mutate(
      { file, mapping, dryRun, encoding },
      { onSuccess: ({ id }) => setParams({ job: String(id) }) },
    );
  };
  const mapped = new Set(Object.values(mapping));
  const ready = file && inspection && REQUIRED_IMPORT_FIELDS.every((field) => mapped.has(field));

  return (
    <article className="space-y-6">
      <PageHeader title="Imports" />
      <section aria-labelledby="import-file" className="max-w-4xl space-y-4">
        <h2 id="import-file" className="text-xl">
          Spreadsheet
        </h2>
        <p className="text-sm text-ink-soft">
          A CSV export from any spreadsheet (UTF-8 or Windows-1252). The accession number is the
          key: a row whose number is already in the catalogue updates that print and never adds a
          second one. Each row is imported whole or not at all.
        </p>
        <label className="block text-sm">
          <span className="mb-1 block text-xs font-semibold tracking-wide text-ink-soft uppercase">
            CSV file
          </span>
          <input
            type="file"
            accept=".csv,text/csv"
            onChange={(event) => choose(event.target.files?.[0] ?? null)}
            className="block text-sm"
          />
        </label>
        <SelectField
          label="Encoding"
          className="max-w-xs"
          options={IMPORT_ENCODINGS.map((value) => ({
            value,
            label: IMPORT_ENCODING_LABELS[value],
          }))}
          value={encoding}
          onChange={(event) => chooseEncoding(event.target.value as ImportEncoding)}
          hint={
            inspection
              ? `Read as ${IMPORT_ENCODING_LABELS[inspection.encoding as ImportEncoding] ?? inspection.encoding}. If letters look wrong below, choose the other encoding.`
              : 'Detect reads UTF-8, and Windows-1252 when the file is not valid UTF-8.'
          }
        />
        <ErrorNotice error={inspect.error} />
        {inspection && (
          <>
            <MappingTable inspection={inspection} mapping={mapping} onChange={setMapping} />
            <div className="flex flex-wrap gap-2">
              <Button onClick={() => run(true)} disabled={!ready || start.isPending}>
                Check every row
              </Button>
              <Button
                tone="primary"
                onClick={() => run(false)}
                disabled={!ready || start.isPending}
              >
                Import
              </Button>
            </div>
          </>
        )}
        <ErrorNotice error={start.error} />
      </section>
      {jobId && (
        <ImportProgress key={jobId} id={jobId}>
          {(job) =>
            job.dryRun && file && ready ? (
              <Button tone="primary" onClick={() => run(false)} disabled={start.isPending}>
                {importGoodRowsLabel(job.rows - job.failed.length)}
              </Button>
            ) : null
          }
        </ImportProgress>
      )}
    </article>
  );
}
