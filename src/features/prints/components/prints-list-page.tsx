import { useQuery } from '@tanstack/react-query';
import { formatCount } from '@shared/domain/format';
import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import { paramFromSorting, sortingFromParam } from '@/components/catalogue/list-sorting';
import { PrintListTable } from '@/components/catalogue/print-list-table';
import { ButtonLink } from '@/components/ui/button';
import { Pager } from '@/components/ui/pager';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { LIST_PAGE_SIZE, printQueries, type PrintListParams } from '@/lib/catalogue';
import { PrintFilters } from './print-filters';
import { useDeferredData } from '@/lib/use-deferred-data';

export function PrintsListPage() {
  const [searchParams, setSearchParams] = useSearchParams();
  const can = useCan();
  const params: PrintListParams = Object.fromEntries(searchParams.entries());
  const page = Number(params.page ?? 1);
  const list = useQuery(printQueries.list({ pageSize: String(LIST_PAGE_SIZE), ...params }));
  const data = useDeferredData(list.data);
  const words = useMemo(() => new Set(data?.matchedWords ?? []), [data]);

  const update = (changes: PrintListParams) => {
    const next = new URLSearchParams(searchParams);
    for (const [key, value] of Object.entries(changes)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    if (!('page' in changes)) next.delete('page');
    setSearchParams(next);
  };
  const total = data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / LIST_PAGE_SIZE));

  return (
    <>
      <PageHeader
        title="Prints"
        eyebrow="Catalogue"
        actions={
          <>
            {can('exports:read') && (
              <a
                className="inline-flex items-center rounded border border-paper-edge px-3 py-1.5 text-sm text-ink no-underline hover:bg-paper-deep"
                href={`/api/prints.csv?${searchParams.toString()}`}
              >
                Download this list (CSV)
              </a>
            )}
            {can('prints:write') && (
              <ButtonLink to={paths.deletedPrints}>Deleted prints</ButtonLink>
            )}
            {can('prints:write') && (
              <ButtonLink to={paths.newPrint} tone="primary">
                New print
              </ButtonLink>
            )}
          </>
        }
      />
      <PrintFilters params={params} facets={data?.facets} onChange={update} />
      <ErrorNotice error={list.error} className="mb-3" />
      {data === undefined && !list.isError ? (
        <Loading label="Loading prints…" />
      ) : (
        <>
          <p className="mb-2 text-sm text-ink-soft" aria-live="polite">
            {formatCount(total, 'print')}
            {list.isFetching && ' · updating…'}
          </p>
          <PrintListTable
            caption="Prints in the catalogue"
            items={data?.items ?? []}
            words={words}
            sorting={sortingFromParam(params.sort, Boolean(params.q))}
            onSortingChange={(sorting) => update({ sort: paramFromSorting(sorting) })}
          />
          <Pager page={page} pages={pages} onPage={(next) => update({ page: String(next) })} />
        </>
      )}
    </>
  );
}
