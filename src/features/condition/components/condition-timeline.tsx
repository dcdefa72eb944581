import { formatDate } from '@shared/domain/format';
import { useQuery } from '@tanstack/react-query';
import type { ConditionReportView, TreatmentView } from '@shared/types/condition';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { conditionQueries } from '../api/condition-queries';
import { ReportEntry } from './report-entry';

type Entry =
  | { kind: 'report'; on: string; id: number; report: ConditionReportView }
  | { kind: 'treatment'; on: string; id: number; treatment: TreatmentView };

/** Condition reports and treatments of a print, newest first, on one line of time. */
export function ConditionTimeline({ printId }: { printId: number }) {
  const reports = useQuery(conditionQueries.reports(printId));
  const treatments = useQuery(conditionQueries.treatments(printId));
  if (reports.isPending || treatments.isPending) return <Loading label="Loading condition…" />;
  if (reports.error || treatments.error) {
    return <ErrorNotice error={reports.error ?? treatments.error} />;
  }
  const entries: Entry[] = [
    ...reports.data.items.map((report) => ({
      kind: 'report' as const,
      on: report.reportedOn,
      id: report.id,
      report,
    })),
    ...treatments.data.items.map((treatment) => ({
      kind: 'treatment' as const,
      on: treatment.treatedOn,
      id: treatment.id,
      treatment,
    })),
  ].sort((a, b) => b.on.localeCompare(a.on) || b.id - a.id);
  if (entries.length === 0) {
    return <p className="text-sm text-ink-faint">No condition reports or treatments yet.</p>;
  }
  return (
    <ol aria-label="Condition timeline" className="space-y-3 border-l-2 border-paper-edge pl-4">
      {entries.map((entry) => (
        <li key={`${entry.kind}-${entry.id}`} className="relative">
          <span
            aria-hidden="true"
            className="absolute top-1.5 -left-[1.4rem] h-2.5 w-2.5 rounded-full border-2 border-paper bg-gall"
          />
          {entry.kind === 'report' ? (
            <ReportEntry report={entry.report} />
          ) : (
            <TreatmentEntry treatment={entry.treatment} />
          )}
        </li>
      ))}
    </ol>
  );
}

function TreatmentEntry({ treatment }: { treatment: TreatmentView }) {
  return (
    <article aria-label={`Treatment of ${treatment.treatedOn}`} className="text-sm">
      <p className="flex flex-wrap items-baseline gap-2">
        <time dateTime={treatment.treatedOn} className="font-mono text-xs text-ink-faint">
          {formatDate(treatment.treatedOn, true)}
        </time>
        <span className="font-medium">Treatment</span>
        {treatment.treatedBy && (
          <span className="text-ink-faint">by {treatment.treatedBy.name}</span>
        )}
      </p>
      <p className="mt-1">{treatment.action}</p>
      {treatment.materials && (
        <p className="text-ink-soft">
          <span className="text-ink-faint">Materials: </span>
          {treatment.materials}
        </p>
      )}
    </article>
  );
}
