import { useQuery } from '@tanstack/react-query';
import type { FixityCheckView } from '@shared/types/asset';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { fixityQueries, useStartFixityCheck } from '../api/fixity-checks';
import { BackupsAndDisk } from './backups-and-disk';

const when = (iso: string) => iso.slice(0, 16).replace('T', ' ');

/** Admin: re-hash every stored original and see what changed or went missing. */
export function FixityPage() {
  const checks = useQuery(fixityQueries.list());
  const start = useStartFixityCheck();
  const items = checks.data?.items ?? [];
  const running = items.some((check) => check.status === 'running');
  return (
    <>
      <PageHeader
        title="Fixity"
        actions={
          <Button
            tone="primary"
            disabled={running || start.isPending}
            onClick={() => start.mutate()}
          >
            {running ? 'Checking…' : 'Check every original now'}
          </Button>
        }
      />
      <p className="mb-4 max-w-prose text-sm text-ink-soft">
        Each original’s SHA-256 was recorded when it was uploaded. A check reads every stored file
        again and compares: a different hash means the file changed (bit rot, a faulty disk, an edit
        outside Printwarden); a missing file means it is gone. Restore either from a backup. The
        same check runs from the command line with <code>npm run fixity</code>.
      </p>
      <ErrorNotice error={start.error ?? checks.error} />
      {checks.isPending && <Loading label="Loading checks…" />}
      {!checks.isPending && items.length === 0 && (
        <p className="text-sm text-ink-faint">No check has run yet.</p>
      )}
      <ol aria-label="Fixity checks, newest first" className="space-y-4">
        {items.map((check) => (
          <CheckReport key={check.id} check={check} />
        ))}
      </ol>
      <BackupsAndDisk />
    </>
  );
}

function CheckReport({ check }: { check: FixityCheckView }) {
  const problems = check.mismatches.length + check.missing.length;
  return (
    <li className="rounded border border-paper-edge bg-paper-deep/50 p-3 text-sm">
      <p className="font-medium">
        Check {check.id}, started {when(check.startedAt)}
        {check.finishedAt && `, finished ${when(check.finishedAt)}`}
      </p>
      <div className="mt-1 flex items-center gap-2">
        <progress
          max={Math.max(check.total, 1)}
          value={check.checked}
          aria-label={`Progress of check ${check.id}`}
          className="h-2 w-64 accent-gall"
        />
        <span>
          {check.checked} of {check.total} files
        </span>
      </div>
      {check.status === 'done' && problems === 0 && (
        <p className="mt-1 text-ok">Every original is intact.</p>
      )}
      {check.status === 'failed' && (
        <p className="mt-1 text-alert">The check stopped on an error.</p>
      )}
      {problems > 0 && (
        <ul className="mt-2 list-disc pl-5 text-alert">
          {check.mismatches.map((item) => (
            <li key={`m${item.assetId}`}>
              Image {item.assetId} has changed: recorded{' '}
              <code className="break-all">{item.expected.slice(0, 16)}…</code>, now{' '}
              <code className="break-all">{item.actual.slice(0, 16)}…</code>
            </li>
          ))}
          {check.missing.map((assetId) => (
            <li key={`x${assetId}`}>Image {assetId}: the stored original is missing</li>
          ))}
        </ul>
      )}
    </li>
  );
}
