import { formatDate } from '@shared/domain/format';
import { isCheckOverdue } from '@shared/domain/tone/check-date';
import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { ToneCheckResponse } from '@shared/types/tone';
import type { ToneStatus } from '@shared/domain/vocabulary';
import { ToneBadge } from '@/components/ui/badges';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { useCan } from '@/lib/session';
import { toneQueries } from '../api/tone-queries';
import { ComparisonTable } from './comparison-table';
import { OverdueMark } from './overdue-mark';
import { PastCheck } from './past-check';
import { ToneCheckForm } from './tone-check-form';
import { TrendCharts } from './trend-charts';

/** The print record's tone section: status and reasons, charts, comparison, checks, a form. */
export function TonePanel({ printId }: { printId: number }) {
  const can = useCan();
  const checks = useQuery(toneQueries.checks(printId));
  const trend = useQuery(toneQueries.trend(printId));
  const [logged, setLogged] = useState<ToneCheckResponse | null>(null);
  if (checks.isPending || trend.isPending) return <Loading label="Loading the tone record…" />;
  if (checks.error || trend.error) return <ErrorNotice error={checks.error ?? trend.error} />;
  const latest = checks.data.items[0];
  const status: ToneStatus = trend.data.status;

  return (
    <section aria-labelledby="record-tone" className="mt-8 border-t border-paper-edge pt-5">
      <h2 id="record-tone" className="mb-2 text-xl">
        Tone watch
      </h2>
      <p className="mb-2 flex flex-wrap items-center gap-2 text-sm">
        <ToneBadge status={status} />
        {trend.data.nextCheckDue && (
          <span>
            Next check due {trend.data.nextCheckDue}
            {isCheckOverdue(trend.data.nextCheckDue) && <OverdueMark />}
          </span>
        )}
      </p>
      {trend.data.flags.length > 0 && (
        <ul aria-label="Tone reasons" className="mb-3 list-disc pl-5 text-sm">
          {trend.data.flags.map((flag) => (
            <li key={`${flag.kind}-${flag.patch}`}>{flag.reason}</li>
          ))}
        </ul>
      )}
      {checks.data.items.length === 0 ? (
        <p className="mb-3 text-sm text-ink-soft">No tone checks yet.</p>
      ) : (
        <>
          <TrendCharts trend={trend.data} />
          <div className="mt-4">
            <ComparisonTable
              rows={checks.data.latestComparison}
              caption={`Latest check (${formatDate(latest?.checkedOn)}) against the baseline`}
            />
          </div>
          <details className="mt-3 text-sm">
            <summary className="cursor-pointer">Past checks ({checks.data.items.length})</summary>
            <ul className="mt-2 space-y-1">
              {checks.data.items.map((check) => (
                <PastCheck
                  key={check.id}
                  check={check}
                  isBaseline={check.id === checks.data.baselineId}
                  editable={can('tone:write')}
                />
              ))}
            </ul>
          </details>
        </>
      )}
      {can('tone:write') && (
        <div className="mt-5 rounded border border-paper-edge bg-paper-deep/50 p-3">
          <h3 className="mb-2 text-lg">Log a check</h3>
          <ToneCheckForm
            printId={printId}
            lastReadings={latest?.readings}
            lastInstrument={latest?.instrument}
            hasBaseline={checks.data.items.length > 0}
            onLogged={setLogged}
            // A refused check must not sit beside the last one's "logged" message.
            onSubmitted={() => setLogged(null)}
          />
          {logged && (
            <div role="status" className="mt-4 space-y-2">
              <p className="text-sm">
                Check of {formatDate(logged.checkedOn, true)} logged. Status now{' '}
                <ToneBadge status={logged.tone.status} />
              </p>
              {logged.warnings.map((warning) => (
                <p
                  key={warning}
                  className="rounded border border-gall bg-gall-light px-3 py-2 text-sm"
                >
                  {warning}
                </p>
              ))}
              <ComparisonTable
                rows={logged.comparison}
                caption="Comparison of the new check with the baseline"
              />
            </div>
          )}
        </div>
      )}
    </section>
  );
}
