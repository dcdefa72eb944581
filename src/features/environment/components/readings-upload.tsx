import { formatCount } from '@shared/domain/format';
import type { ReadingsImportReport } from '@shared/types/environment';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { useUploadReadings } from '../api/environment-api';

/** What a check or an upload found, in plain words. */
function ReportSummary({ report }: { report: ReadingsImportReport }) {
  return (
    <div role="status" className="mt-3 rounded border border-paper-edge bg-white/60 p-3 text-sm">
      <p className="font-semibold">
        {report.dryRun
          ? `Checked: ${formatCount(report.accepted, 'reading')} would be stored.`
          : `Stored ${formatCount(report.accepted, 'reading')} over ${formatCount(report.days, 'day')}.`}
      </p>
      <ul className="mt-1 list-disc pl-5 text-ink-soft">
        {report.logger.key && (
          <li>
            Logger {report.logger.key}
            {report.logger.remembered ? ' (its columns and time zone were remembered)' : ''}; times
            read in {report.timeZone}.
          </li>
        )}
        {report.from && report.to && (
          <li>
            From {report.from.slice(0, 16).replace('T', ' ')} to{' '}
            {report.to.slice(0, 16).replace('T', ' ')} UTC
            {report.intervalMinutes ? `, a reading every ${report.intervalMinutes} minutes` : ''}.
          </li>
        )}
        {report.duplicates > 0 && (
          <li>{formatCount(report.duplicates, 'repeated time')} dropped.</li>
        )}
        {report.alreadyStored > 0 && (
          <li>{formatCount(report.alreadyStored, 'reading')} already stored, left as they were.</li>
        )}
        {report.rejectedCount > 0 && (
          <li>
            {formatCount(report.rejectedCount, 'row')} refused
            {report.rejected[0]
              ? ` (row ${report.rejected[0].row}: ${report.rejected[0].reason})`
              : ''}
            .
          </li>
        )}
        {report.gapCount > 0 && (
          <li>
            {formatCount(report.gapCount, 'gap')} in the logging
            {report.gaps[0] ? `, the first of ${report.gaps[0].minutes} minutes` : ''}.
          </li>
        )}
        {!report.dryRun && report.alertsOpened > 0 && (
          <li className="text-alert">{formatCount(report.alertsOpened, 'alert')} opened.</li>
        )}
      </ul>
    </div>
  );
}

/** A conservator's upload of a logger's CSV export, with a check first that writes nothing. */
export function ReadingsUpload({ placeId }: { placeId: number }) {
  const upload = useUploadReadings(placeId);
  const [file, setFile] = useState<File | null>(null);
  const [loggerId, setLoggerId] = useState('');
  const [timeZone, setTimeZone] = useState('');
  const [columns, setColumns] = useState({ timestamp: '', temperature: '', humidity: '' });
  const send = (dryRun: boolean) => (event?: FormEvent) => {
    event?.preventDefault();
    if (file) upload.mutate({ file, loggerId, timeZone, columns, dryRun });
  };
  return (
    <form
      onSubmit={send(false)}
      className="rounded border border-paper-edge p-3"
      aria-label="Upload logger readings"
    >
      <h3 className="mb-2 text-lg">Upload logger readings</h3>
      <p className="mb-2 max-w-prose text-xs text-ink-faint">
        A CSV export with a time, °C and % RH per row. The logger&apos;s columns and time zone are
        remembered by its serial number; leave them empty to use what was remembered or let the
        columns be recognised by name.
      </p>
      <div className="grid gap-2 sm:grid-cols-3">
        <div className="flex flex-col gap-1">
          <label
            htmlFor="readings-file"
            className="text-xs font-semibold tracking-wide text-ink-soft"
          >
            Logger file (CSV)
          </label>
          <input
            id="readings-file"
            type="file"
            accept=".csv,.txt,text/csv,text/plain"
            onChange={(event) => setFile(event.target.files?.[0] ?? null)}
            className="text-sm"
          />
        </div>
        <TextField
          label="Logger serial (if the file does not name it)"
          value={loggerId}
          onChange={(e) => setLoggerId(e.target.value)}
        />
        <TextField
          label="Time zone of the logger's clock"
          placeholder="Europe/London"
          value={timeZone}
          onChange={(e) => setTimeZone(e.target.value)}
        />
        <TextField
          label="Time column"
          value={columns.timestamp}
          onChange={(e) => setColumns({ ...columns, timestamp: e.target.value })}
        />
        <TextField
          label="Temperature column"
          value={columns.temperature}
          onChange={(e) => setColumns({ ...columns, temperature: e.target.value })}
        />
        <TextField
          label="Humidity column"
          value={columns.humidity}
          onChange={(e) => setColumns({ ...columns, humidity: e.target.value })}
        />
      </div>
      <div className="mt-3 flex gap-2">
        <Button onClick={() => send(true)()} disabled={!file || upload.isPending}>
          Check the file
        </Button>
        <Button tone="primary" type="submit" disabled={!file || upload.isPending}>
          {upload.isPending ? 'Sending…' : 'Upload readings'}
        </Button>
      </div>
      <ErrorNotice error={upload.error} className="mt-2" />
      {upload.data && <ReportSummary report={upload.data} />}
    </form>
  );
}
