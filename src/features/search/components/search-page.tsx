import { useQuery } from '@tanstack/react-query';
import { formatCount } from '@shared/domain/format';
import clsx from 'clsx';
import { lazy, Suspense, useMemo, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Pager } from '@/components/ui/pager';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { useCan } from '@/lib/session';
import { paramFromSorting, sortingFromParam } from '@/components/catalogue/list-sorting';
import { PrintListTable } from '@/components/catalogue/print-list-table';
import { LIST_PAGE_SIZE, printQueries } from '@/lib/catalogue';
import { QueryBox } from './query-box';
import { rememberOpened, useFocusOpened, usePicks } from './return-to-results';
import { ResultsGrid } from './search-results';
import { useSearchParamsState } from './use-search-params-state';
import { useDeferredData } from '@/lib/use-deferred-data';
import { useAfterFirstDraw } from '@/lib/use-after-first-draw';
import { useMediaQuery } from '@/lib/use-media-query';

const SearchAside = lazy(async () => ({
  default: (await import('./search-aside')).SearchAside,
}));

/** Tailwind's `lg`: from this width the filters stand beside the results, always shown. */
const FILTERS_BESIDE = '(min-width: 64rem)';

const SORTS = [
  { value: '', label: 'Best match (words) / newest accession' },
  { value: 'accession', label: 'Accession number' },
  { value: 'madeOn', label: 'Date made, oldest first' },
  { value: '-madeOn', label: 'Date made, newest first' },
  { value: 'title', label: 'Title' },
];

/** The curator's search: words, filters with counts, ranges, saved searches, picking. */
export function SearchPage() {
  const can = useCan();
  const { params, view, update, queryString } = useSearchParamsState();
  const results = useQuery(printQueries.list({ pageSize: String(LIST_PAGE_SIZE), ...params }));
  const [picked, setPicked] = usePicks();
  const [filtersOpen, setFiltersOpen] = useState(false);
  // On a phone the folded filters are not drawn until first opened (then kept, so a half-typed
  // name survives folding them): their date fields alone were a 17 ms first-use task on load.
  const [filtersOpened, setFiltersOpened] = useState(false);
  const filtersWanted = useMediaQuery(FILTERS_BESIDE) || filtersOpened;
  const data = useDeferredData(results.data);
  // The filters and panels beside the results draw once the results have been painted.
  const asideShown = useAfterFirstDraw(data !== undefined);
  const searching = data === undefined && !results.isError;
  useFocusOpened(Boolean(data));
  const words = useMemo(() => new Set(data?.matchedWords ?? []), [data]);
  const page = Number(params.page ?? 1);
  const total = data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / LIST_PAGE_SIZE));
  const onPick = (id: number, on: boolean) =>
    setPicked((list) => (on ? [...new Set([...list, id])] : list.filter((x) => x !== id)));
  const pickedSet = useMemo(() => new Set(picked), [picked]);

  return (
    <>
      <PageHeader
        title="Search"
        eyebrow="Find prints"
        actions={
          can('exports:read') && (
            <a
              className="inline-flex items-center rounded border border-paper-edge px-3 py-1.5 text-sm text-ink no-underline hover:bg-paper-deep"
              href={`/api/prints.csv?${queryString()}`}
            >
              Download results (CSV)
            </a>
          )
        }
      />
      <div role="search" className="mb-4">
        <QueryBox value={params.q ?? ''} onSearch={(q) => update({ q })} />
      </div>
      {/* On a phone the filters would push every result a screen or more down: they fold
          away behind one button, and the results come first. */}
      <button
        type="button"
        className="mb-3 rounded border border-paper-edge bg-white px-3 py-2 text-sm lg:hidden"
        aria-expanded={filtersOpen}
        aria-controls="search-filters"
        onClick={() => {
          setFiltersOpened(true);
          setFiltersOpen((open) => !open);
        }}
      >
        {filtersOpen ? 'Hide filters and picks' : 'Filters, saved searches and picks'}
      </button>
      <div className="grid gap-5 lg:grid-cols-[15rem_1fr]">
        <aside
          id="search-filters"
          aria-label="Filters"
          className={clsx('flex-col gap-5 lg:flex', filtersOpen ? 'flex' : 'hidden')}
        >
          {filtersWanted && data && asideShown ? (
            <Suspense fallback={<Loading label="Loading the filters…" />}>
              <SearchAside
                params={params}
                facets={data.facets}
                onChange={update}
                queryString={queryString()}
                picked={picked}
                onPicksDone={() => setPicked(() => [])}
              />
            </Suspense>
          ) : (
            filtersWanted && <Loading label="Loading the filters…" />
          )}
        </aside>
        <section aria-label="Results" className="min-w-0">
          <div className="mb-2 flex flex-wrap items-center justify-between gap-2 text-sm">
            <p aria-live="polite" className="text-ink-soft">
              {searching ? 'Searching…' : formatCount(total, 'print')}
              {results.isFetching && !searching && ' · updating…'}
            </p>
            <div className="flex flex-wrap items-center gap-2">
              <label htmlFor="search-sort" className="text-ink-soft">
                Order
              </label>
              <select
                id="search-sort"
                value={params.sort ?? ''}
                onChange={(event) => update({ sort: event.target.value })}
                className="rounded border border-paper-edge bg-white px-2 py-1"
              >
                {SORTS.map((sort) => (
                  <option key={sort.value} value={sort.value}>
                    {sort.label}
                  </option>
                ))}
              </select>
              <div role="group" aria-label="Show results as" className="flex">
                {(['table', 'grid'] as const).map((kind) => (
                  <Button
                    key={kind}
                    aria-pressed={view === kind}
                    tone={view === kind ? 'primary' : 'quiet'}
                    onClick={() =>
                      update({ view: kind === 'grid' ? 'grid' : '', page: params.page ?? '' })
                    }
                  >
                    {kind === 'table' ? 'Table' : 'Grid'}
                  </Button>
                ))}
              </div>
            </div>
          </div>
          <ErrorNotice error={results.error} className="mb-3" />
          {searching ? (
            <Loading label="Searching…" />
          ) : view === 'grid' ? (
            <ResultsGrid
              items={data?.items ?? []}
              words={words}
              picked={pickedSet}
              onPick={onPick}
            />
          ) : (
            <PrintListTable
              caption="Search results"
              items={data?.items ?? []}
              sorting={sortingFromParam(params.sort, Boolean(params.q))}
              onSortingChange={(sorting) => update({ sort: paramFromSorting(sorting) ?? '' })}
              words={words}
              picked={pickedSet}
              onPick={onPick}
              onOpen={rememberOpened}
            />
          )}
          {/* Under the results once they are in: drawn before them, it jumped down. */}
          {data && (
            <Pager page={page} pages={pages} onPage={(next) => update({ page: String(next) })} />
          )}
        </section>
      </div>
    </>
  );
}
