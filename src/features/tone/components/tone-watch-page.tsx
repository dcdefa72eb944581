import { useQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router-dom';
import { TONE_STATUSES } from '@shared/domain/vocabulary';
import { ToneBadge } from '@/components/ui/badges';
import { ButtonLink } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { referenceQueries } from '@/lib/reference-api';
import { toneQueries, type ToneWatchParams } from '../api/tone-queries';
import { useCan } from '@/lib/session';
import { AlertsList } from './alerts-list';
import { PlaceAlertsList } from './place-alerts-list';
import { Sparkline } from './sparkline';
import { formatCount } from '@shared/domain/format';
import { useDeferredData } from '@/lib/use-deferred-data';
import { OverdueMark } from './overdue-mark';

/** The conservator's list: prints needing attention, most urgent first, and open alerts. */
export function ToneWatchPage() {
  const [search, setSearch] = useSearchParams();
  const params: ToneWatchParams = Object.fromEntries(search.entries());
  const list = useQuery(toneQueries.watch(params));
  const data = useDeferredData(list.data);
  const pending = data === undefined && !list.isError;
  const papers = useQuery(referenceQueries.papers());
  const places = useQuery(referenceQueries.locations());
  const can = useCan();
  const set = (key: keyof ToneWatchParams, value: string) => {
    const next = new URLSearchParams(search);
    if (value) next.set(key, value);
    else next.delete(key);
    setSearch(next);
  };
  return (
    <>
      <PageHeader
        title="Tone watch"
        eyebrow="Conservation"
        actions={
          <>
            <ButtonLink to={paths.toneRounds}>Check round</ButtonLink>
            <ButtonLink to={paths.toneImport}>Import measurements</ButtonLink>
          </>
        }
      />
      <div
        className="mb-4 grid gap-3 sm:grid-cols-4"
        role="search"
        aria-label="Filter the tone watch"
      >
        <SelectField
          label="Status"
          value={params.status ?? ''}
          onChange={(e) => set('status', e.target.value)}
          placeholder="Any status"
          options={TONE_STATUSES.filter((s) => s !== 'unchecked').map((s) => ({
            value: s,
            label: s,
          }))}
        />
        <SelectField
          label="Place"
          value={params.locationId ?? ''}
          onChange={(e) => set('locationId', e.target.value)}
          placeholder="Anywhere"
          options={(places.data ?? []).map((p) => ({
            value: p.id,
            label: `${p.code} · ${p.name}`,
          }))}
        />
        <SelectField
          label="Paper"
          value={params.paperId ?? ''}
          onChange={(e) => set('paperId', e.target.value)}
          placeholder="Any paper"
          options={(papers.data ?? []).map((p) => ({ value: p.id, label: p.name }))}
        />
        <SelectField
          label="Show"
          value={params.scope ?? 'attention'}
          onChange={(e) => set('scope', e.target.value === 'attention' ? '' : e.target.value)}
          options={[
            { value: 'attention', label: 'Needing attention' },
            { value: 'all', label: 'All prints' },
          ]}
        />
      </div>
      <ErrorNotice error={list.error} />
      {pending ? (
        <Loading label="Loading the tone watch…" />
      ) : (
        <>
          <p className="mb-2 text-sm text-ink-soft" aria-live="polite">
            {formatCount(data?.total ?? 0, 'print')}
            {(data?.total ?? 0) > (data?.items.length ?? 0) &&
              `, the ${data?.items.length} most urgent shown`}
          </p>
          <div className="overflow-x-auto">
            <table className="w-full text-sm">
              <caption className="sr-only">Prints needing attention, most urgent first</caption>
              <thead>
                <tr className="border-b border-paper-edge text-left text-xs text-ink-faint uppercase">
                  <th scope="col" className="py-1.5 pr-3">
                    Print
                  </th>
                  <th scope="col" className="pr-3">
                    Status
                  </th>
                  <th scope="col" className="pr-3">
                    Why
                  </th>
                  <th scope="col" className="pr-3">
                    <span className="normal-case">ΔE00</span> trend
                  </th>
                  <th scope="col" className="pr-3">
                    Next check
                  </th>
                  <th scope="col">Place</th>
                </tr>
              </thead>
              <tbody>
                {data?.items.map((item) => (
                  <tr key={item.print.id} className="border-b border-paper-edge/60 align-top">
                    <td className="py-1.5 pr-3">
                      <Link to={paths.print(item.print.id)}>{item.print.title}</Link>
                      <div className="font-mono text-xs text-ink-faint">
                        {item.print.accessionNumber}
                      </div>
                    </td>
                    <td className="pr-3">
                      <ToneBadge status={item.status} />
                    </td>
                    <td className="pr-3">
                      <ul>
                        {item.reasons.slice(0, 3).map((reason) => (
                          <li key={reason}>{reason}</li>
                        ))}
                        {item.reasons.length > 3 && (
                          <li className="text-ink-faint">and {item.reasons.length - 3} more</li>
                        )}
                      </ul>
                    </td>
                    <td className="pr-3">
                      <Sparkline values={item.sparkline} />
                    </td>
                    <td className="pr-3 whitespace-nowrap tabular-nums">
                      {item.nextCheckDue ?? '—'}
                      {item.overdue && <OverdueMark />}
                    </td>
                    <td className="font-mono text-xs">{item.print.location?.code ?? '—'}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
      {/* Below the list once it is in: drawn first, the alerts jumped down when it came. */}
      {!pending && <AlertsList />}
      {!pending && can('environment:write') && <PlaceAlertsList />}
    </>
  );
}
