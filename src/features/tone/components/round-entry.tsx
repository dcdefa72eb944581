import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { CheckRoundPlace } from '@shared/types/tone';
import { ToneBadge } from '@/components/ui/badges';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/notices';
import { toneQueries } from '../api/tone-queries';
import { ComparisonTable } from './comparison-table';
import { ToneCheckForm } from './tone-check-form';
import type { ToneCheckResponse } from '@shared/types/tone';

type RoundPrint = CheckRoundPlace['prints'][number] & { place: CheckRoundPlace['location'] };

/** Steps through the round one print at a time; logging a check moves on to the next. */
export function RoundEntry({ prints }: { prints: RoundPrint[] }) {
  const [index, setIndex] = useState(0);
  const [last, setLast] = useState<{ accession: string; result: ToneCheckResponse } | null>(null);
  const print = prints[Math.min(index, prints.length - 1)]!;
  const checks = useQuery(toneQueries.checks(print.id));
  const latest = checks.data?.items[0];
  return (
    <div className="grid gap-5 lg:grid-cols-[minmax(0,1.3fr)_minmax(0,1fr)]">
      <section aria-label="Current print" className="rounded border border-paper-edge p-4">
        <p className="text-sm text-ink-faint">
          Print {index + 1} of {prints.length} · {print.place?.path ?? 'no place recorded'}
        </p>
        <h2 className="text-2xl">
          <span className="font-mono text-lg">{print.accessionNumber}</span> {print.title}
        </h2>
        <p className="mb-3 text-sm">
          <ToneBadge status={print.status} /> due {print.nextCheckDue}
        </p>
        {checks.isPending ? (
          <Loading label="Loading the last check…" />
        ) : (
          <ToneCheckForm
            key={print.id}
            printId={print.id}
            lastReadings={latest?.readings}
            lastInstrument={latest?.instrument}
            hasBaseline={(checks.data?.items.length ?? 0) > 0}
            onLogged={(result) => {
              setLast({ accession: print.accessionNumber, result });
              setIndex((i) => Math.min(i + 1, prints.length - 1));
            }}
          />
        )}
        <div className="mt-4 flex gap-2">
          <Button disabled={index === 0} onClick={() => setIndex((i) => i - 1)}>
            ← Previous print
          </Button>
          <Button disabled={index >= prints.length - 1} onClick={() => setIndex((i) => i + 1)}>
            Skip to next →
          </Button>
        </div>
      </section>
      <aside aria-label="Last logged" role="status">
        {last && (
          <>
            <p className="mb-2 text-sm">
              Logged {last.accession}: now <ToneBadge status={last.result.tone.status} />
            </p>
            <ComparisonTable
              rows={last.result.comparison}
              caption={`${last.accession} against its baseline`}
            />
          </>
        )}
      </aside>
    </div>
  );
}
