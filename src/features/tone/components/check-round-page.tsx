import { useQuery } from '@tanstack/react-query';
import { isCheckOverdue, todayIso } from '@shared/domain/tone/check-date';
import { useCallback, useState } from 'react';
import { Link, useSearchParams } from 'react-router-dom';
import { ToneBadge } from '@/components/ui/badges';
import { Button } from '@/components/ui/button';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { toneQueries } from '../api/tone-queries';
import { useUnsavedChanges } from '@/lib/unsaved-changes';
import { anyReadingTyped, RoundEntry, type RoundDrafts } from './round-entry';
import { currentRoundPeriod } from '@shared/domain/tone/round-period';
import { OverdueMark } from './overdue-mark';

/** Prints due in a period, by place in shelf order: printable, with a step-by-step entry mode. */
export function CheckRoundPage() {
  const [search, setSearch] = useSearchParams();
  const fallback = currentRoundPeriod(todayIso());
  const from = search.get('from') ?? fallback.from;
  const to = search.get('to') ?? fallback.to;
  const round = useQuery(toneQueries.round(from, to));
  const [entering, setEntering] = useState(false);
  // Kept here, not in the entry: showing another period must not drop readings typed for
  // prints that are due in both. Back or a link away asks first while any are typed.
  const [drafts] = useState<RoundDrafts>(() => new Map());
  const guard = useUnsavedChanges(useCallback(() => anyReadingTyped(drafts), [drafts]));
  const prints =
    round.data?.places.flatMap((place) =>
      place.prints.map((print) => ({ ...print, place: place.location })),
    ) ?? [];

  return (
    <>
      <PageHeader
        title="Check round"
        eyebrow="Tone watch"
        actions={
          <span className="flex gap-2 print:hidden">
            <Button onClick={() => window.print()}>Print the round</Button>
            <Button
              tone="primary"
              disabled={prints.length === 0}
              onClick={() => setEntering((on) => !on)}
            >
              {entering ? 'Back to the list' : 'Enter readings'}
            </Button>
          </span>
        }
      />
      <form
        className="mb-4 flex flex-wrap items-end gap-3 print:hidden"
        aria-label="Period of the round"
        onSubmit={(e) => {
          e.preventDefault();
          const data = new FormData(e.currentTarget);
          setSearch({ from: String(data.get('from')), to: String(data.get('to')) });
        }}
      >
        <DateField label="Due from" name="from" defaultValue={from} key={`f${from}`} />
        <DateField label="Due by" name="to" defaultValue={to} key={`t${to}`} />
        <Button type="submit">Show</Button>
      </form>
      {!round.error && (
        <p className="mb-3 text-sm text-ink-soft">
          Prints whose next check falls due from {from} to {to}, and any still overdue from before.
        </p>
      )}
      <ErrorNotice error={round.error} />
      {round.isPending ? (
        <Loading label="Gathering the round…" />
      ) : entering ? (
        <RoundEntry key={`${from} ${to}`} prints={prints} drafts={drafts} />
      ) : (
        round.data?.places.map((place) => (
          <section
            key={place.location?.id ?? 'none'}
            aria-label={place.location?.path ?? 'No place recorded'}
            className="mb-5 break-inside-avoid"
          >
            <h2 className="mb-1 text-lg">
              {place.location ? (
                <>
                  {place.location.path}{' '}
                  <span className="font-mono text-sm text-ink-faint">{place.location.code}</span>
                </>
              ) : (
                'No place recorded'
              )}
            </h2>
            <ol className="divide-y divide-paper-edge text-sm">
              {place.prints.map((print) => (
                <li key={print.id} className="flex flex-wrap items-center gap-3 py-1">
                  <span
                    className="inline-block h-4 w-4 border border-ink-faint"
                    aria-hidden="true"
                  />
                  <span className="font-mono">{print.accessionNumber}</span>
                  <Link to={paths.print(print.id)} className="min-w-[60%] flex-1 sm:min-w-0">
                    {print.title}
                  </Link>
                  {/* The patches to read sit beside the short status chip (on a phone, under
                      the title); the due date follows, on the next line if there is no room. */}
                  <span className="flex basis-full flex-wrap items-center gap-x-3 gap-y-1 pl-7 sm:basis-auto sm:pl-0">
                    <span className="flex items-center gap-2">
                      <ToneBadge status={print.status} />
                      <span className="text-xs text-ink-faint">{print.lastPatches.join(', ')}</span>
                    </span>
                    {/* Overdue by the round's first day: still owed from before the round. */}
                    <span
                      className={`tabular-nums ${isCheckOverdue(print.nextCheckDue, from) ? 'text-alert' : ''}`}
                    >
                      due {print.nextCheckDue}
                      {isCheckOverdue(print.nextCheckDue, from) && <OverdueMark />}
                    </span>
                  </span>
                </li>
              ))}
            </ol>
          </section>
        ))
      )}
      {round.data && round.data.total === 0 && (
        <p className="text-sm">No checks fall due in this period.</p>
      )}
      {guard.dialog}
    </>
  );
}
