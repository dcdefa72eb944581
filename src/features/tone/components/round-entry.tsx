import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useState } from 'react';
import type { CheckRoundPlace, ToneCheckResponse } from '@shared/types/tone';
import { ToneBadge } from '@/components/ui/badges';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/notices';
import { toneQueries } from '../api/tone-queries';
import { ComparisonTable } from './comparison-table';
import { ToneCheckForm, type ToneCheckDraft } from './tone-check-form';

type RoundPrint = CheckRoundPlace['prints'][number] & { place: CheckRoundPlace['location'] };

/** Readings typed per print and not yet logged; mutated in place (typing needs no render). */
export type RoundDrafts = Map<number, ToneCheckDraft>;

/** Whether any draft holds a typed number (then leaving would lose it). */
export function anyReadingTyped(drafts: RoundDrafts): boolean {
  return [...drafts.values()].some((draft) =>
    draft.rows.some((row) => `${row.L}${row.a}${row.b}`.trim() !== ''),
  );
}

/** The index of the next print not yet logged after `index` (then from the start), if any. */
function nextUnlogged(
  prints: RoundPrint[],
  index: number,
  logged: ReadonlySet<number>,
): number | undefined {
  const order = [...prints.keys()].map((i) => (index + 1 + i) % prints.length);
  return order.find((i) => i !== index && !logged.has(prints[i]!.id));
}

/**
 * Steps through the round one print at a time; logging a check moves on to the next. The
 * prints are those of the round when entry began: a logged print is no longer due and
 * leaves the round's list, but must not shift the ones after it. What is typed for a print
 * stays with it in `drafts`, which the page owns so that a change of period keeps it.
 */
export function RoundEntry({
  prints: roundPrints,
  drafts,
}: {
  prints: RoundPrint[];
  drafts: RoundDrafts;
}) {
  const [prints] = useState(roundPrints);
  const [index, setIndex] = useState(0);
  const [logged, setLogged] = useState<ReadonlySet<number>>(new Set());
  const [last, setLast] = useState<{ accession: string; result: ToneCheckResponse } | null>(null);
  const [focusForm, setFocusForm] = useState(false);
  const print = prints[Math.min(index, prints.length - 1)]!;
  const checks = useQuery(toneQueries.checks(print.id));
  const latest = checks.data?.items[0];
  // The next print's last check is fetched while this one is read, so stepping on shows its
  // form at once instead of "Loading the last check…" at the cabinet.
  const queryClient = useQueryClient();
  const upcoming = prints[nextUnlogged(prints, index, logged) ?? -1];
  useEffect(() => {
    if (upcoming) void queryClient.prefetchQuery(toneQueries.checks(upcoming.id));
  }, [queryClient, upcoming]);
  const keepDraft = useCallback(
    (draft: ToneCheckDraft) => {
      drafts.set(print.id, draft);
    },
    [drafts, print.id],
  );

  const go = (to: number) => {
    setFocusForm(false);
    setIndex(to);
  };
  const afterLogging = (result: ToneCheckResponse) => {
    drafts.delete(print.id);
    setLast({ accession: print.accessionNumber, result });
    const done = new Set(logged).add(print.id);
    setLogged(done);
    const next = nextUnlogged(prints, index, done);
    if (next !== undefined) {
      setFocusForm(true);
      setIndex(next);
    }
  };
  const allLogged = logged.size === prints.length;

  return (
    <div className="round-entry grid gap-5 lg:grid-cols-[minmax(0,1.3fr)_minmax(0,1fr)]">
      <section aria-label="Current print" className="rounded border border-paper-edge p-3 sm:p-4">
        <p className="text-sm text-ink-faint">
          Print {index + 1} of {prints.length} · {logged.size} logged ·{' '}
          {print.place?.path ?? 'no place recorded'}
        </p>
        <h2 className="text-2xl">
          <span className="font-mono text-lg">{print.accessionNumber}</span> {print.title}
        </h2>
        <p className="mb-3 text-sm">
          <ToneBadge status={print.status} /> due {print.nextCheckDue}
        </p>
        {allLogged ? (
          <p role="status" className="rounded bg-gall-light px-3 py-2 text-sm">
            Every print of this round is logged.
          </p>
        ) : logged.has(print.id) ? (
          <p className="rounded bg-gall-light px-3 py-2 text-sm">This print is logged.</p>
        ) : checks.isPending ? (
          <Loading label="Loading the last check…" />
        ) : (
          <ToneCheckForm
            key={print.id}
            printId={print.id}
            lastReadings={latest?.readings}
            lastInstrument={latest?.instrument}
            hasBaseline={(checks.data?.items.length ?? 0) > 0}
            draft={drafts.get(print.id)}
            onDraftChange={keepDraft}
            focusOnMount={focusForm}
            onLogged={afterLogging}
          />
        )}
        <div className="mt-4 flex flex-wrap gap-2">
          <Button disabled={index === 0} onClick={() => go(index - 1)}>
            ← Previous print
          </Button>
          <Button disabled={index >= prints.length - 1} onClick={() => go(index + 1)}>
            Next print →
          </Button>
        </div>
      </section>
      <aside aria-label="Last logged" role="status">
        {last && (
          <>
            <p className="mb-2 text-sm">
              Logged {last.accession}: now <ToneBadge status={last.result.tone.status} />
            </p>
            {last.result.warnings.map((warning) => (
              <p
                key={warning}
                className="mb-2 rounded border border-gall bg-gall-light px-3 py-2 text-sm"
              >
                {warning}
              </p>
            ))}
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
