import { useQuery } from '@tanstack/react-query';
import { formatCount } from '@shared/domain/format';
import { useSearchParams } from 'react-router-dom';
import { ButtonLink } from '@/components/ui/button';
import { Pager } from '@/components/ui/pager';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { printQueries, type PrintListParams } from '../api/print-queries';
import { paramFromSorting, sortingFromParam } from './list-params';
import { PrintFilters } from './print-filters';
import { PrintsTable } from './prints-table';

const PAGE_SIZE = 25;

export function PrintsListPage() {
  const [searchParams, setSearchParams] = useSearchParams();
  const can = useCan();
  const params: PrintListParams = Object.fromEntries(searchParams.entries());
  const page = Number(params.page ?? 1);
  const list = useQuery(printQueries.list({ pageSize: String(PAGE_SIZE), ...params }));

  const update = (changes: PrintListParams) => {
    const next = new URLSearchParams(searchParams);
    for (const [key, value] of Object.entries(changes)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    if (!('page' in changes)) next.delete('page');
    setSearchParams(next);
  };
  const total = list.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / PAGE_SIZE));

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
                Download checklist (CSV)
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
      <PrintFilters params={params} facets={list.data?.facets} onChange={update} />
      <ErrorNotice error={list.error} className="mb-3" />
      {list.isPending ? (
        <Loading label="Loading prints…" />
      ) : (
        <>
          <p className="mb-2 text-sm text-ink-soft" aria-live="polite">
            {formatCount(total, 'print')}
            {list.isFetching && ' · updating…'}
          </p>
          <PrintsTable
            items={list.data?.items ?? []}
            sorting={sortingFromParam(params.sort, Boolean(params.q))}
            onSortingChange={(sorting) => update({ sort: paramFromSorting(sorting) })}
          />
          <Pager page={page} pages={pages} onPage={(next) => update({ page: String(next) })} />
        </>
      )}
    </>
  );
}
