import { useQuery } from '@tanstack/react-query';
import { lazy, Suspense } from 'react';
import { useSearchParams } from 'react-router-dom';
import { formatSigned } from '@shared/domain/format';
import { SMALL_GROUP } from '@shared/domain/tone/cohort-stats';
import { SelectField } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { useCan } from '@/lib/session';
import { toneQueries } from '../api/tone-queries';

const CohortChart = lazy(() => import('./cohort-chart'));

const DIMENSIONS = [
  { value: 'washing', label: 'Washing time' },
  { value: 'fixing', label: 'Fixing time' },
  { value: 'paper', label: 'Paper' },
  { value: 'batch', label: 'Solution batch' },
  { value: 'light', label: 'Light received on display (lifetime lx·h)' },
];
/** Grouping by place says where prints are kept: offered to roles that may see places. */
const PLACE = { value: 'place', label: 'Place (where the prints are kept)' };

/** Which practices age well: tone-change rate by washing, fixing, paper or batch. */
export function InsightsPage() {
  const [search, setSearch] = useSearchParams();
  const by = search.get('by') ?? 'washing';
  const can = useCan();
  const dimensions = can('locations:read') ? [...DIMENSIONS, PLACE] : DIMENSIONS;
  const cohorts = useQuery(toneQueries.cohorts(by));
  return (
    <>
      <PageHeader title="Insights" eyebrow="Which practices age well" />
      <div className="mb-4 max-w-xs">
        <SelectField
          label="Group prints by"
          value={by}
          onChange={(e) => setSearch({ by: e.target.value })}
          options={dimensions}
        />
      </div>
      <p className="mb-3 max-w-prose text-sm text-ink-soft">
        Each print's rate is the ΔE00 per year of its fastest-changing patch, fitted over its checks
        since the baseline (at least 3). Bars show a group's mean; whiskers its 95 % interval
        (Student t), which says how uncertain the mean is. Groups of fewer than {SMALL_GROUP} prints
        are too small to mean much.
      </p>
      <ErrorNotice error={cohorts.error} />
      {cohorts.isPending ? (
        <Loading label="Grouping prints…" />
      ) : (
        cohorts.data && (
          <>
            <Suspense fallback={<Loading label="Drawing the chart…" />}>
              <CohortChart groups={cohorts.data.groups} />
            </Suspense>
            <table className="mt-4 w-full text-sm tabular-nums">
              <caption className="sr-only">Tone-change rate by group</caption>
              <thead>
                <tr className="border-b border-paper-edge text-left text-xs text-ink-faint uppercase">
                  <th scope="col" className="py-1 pr-3">
                    Group
                  </th>
                  <th scope="col" className="px-2 text-right">
                    Prints
                  </th>
                  <th scope="col" className="px-2 text-right">
                    Checks
                  </th>
                  <th scope="col" className="px-2 text-right">
                    Mean <span className="normal-case">ΔE00</span> a year
                  </th>
                  <th scope="col" className="px-2 text-right">
                    95 % interval
                  </th>
                  <th scope="col" className="pl-2">
                    Note
                  </th>
                </tr>
              </thead>
              <tbody>
                {cohorts.data.groups.map((group) => (
                  <tr key={group.key} className="border-b border-paper-edge/60">
                    <th scope="row" className="py-1 pr-3 text-left font-normal">
                      {group.label}
                    </th>
                    <td className="px-2 text-right">{group.prints}</td>
                    <td className="px-2 text-right">{group.checks}</td>
                    <td className="px-2 text-right">
                      {group.meanRatePerYear == null ? '—' : formatSigned(group.meanRatePerYear, 2)}
                    </td>
                    <td className="px-2 text-right">
                      {group.interval
                        ? `${formatSigned(group.interval.low, 2)} to ${formatSigned(group.interval.high, 2)}`
                        : '—'}
                    </td>
                    <td className="pl-2 text-xs">
                      {group.small && (
                        <span className="text-alert">
                          Too few prints to mean anything ({group.prints} &lt; {SMALL_GROUP}).
                        </span>
                      )}
                      {group.printsWithTrend < group.prints &&
                        ` ${group.prints - group.printsWithTrend} without a trend yet.`}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </>
        )
      )}
    </>
  );
}
