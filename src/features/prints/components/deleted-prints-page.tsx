import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Button, ButtonLink } from '@/components/ui/button';
import { Pager } from '@/components/ui/pager';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { printQueries } from '@/lib/catalogue';
import { useRestorePrint } from '../api/restore-print';

/** Soft-deleted prints, newest accession first, each with a way back into the catalogue. */
export function DeletedPrintsPage() {
  const [page, setPage] = useState(1);
  const list = useQuery(printQueries.list({ deleted: 'true', page: String(page), pageSize: '50' }));
  const restore = useRestorePrint();
  const total = list.data?.total ?? 0;
  return (
    <>
      <PageHeader
        title="Deleted prints"
        eyebrow="Catalogue"
        actions={<ButtonLink to={paths.prints}>Back to the prints</ButtonLink>}
      />
      <p className="mb-3 max-w-prose text-sm text-ink-soft">
        Deleted prints keep their accession numbers and their audit trail. Restoring puts a print
        back in the catalogue as it was.
      </p>
      <ErrorNotice error={list.error ?? restore.error} className="mb-3" />
      {list.isPending ? (
        <Loading />
      ) : total === 0 ? (
        <p className="text-sm text-ink-faint">No deleted prints.</p>
      ) : (
        <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/60">
          {list.data?.items.map((item) => (
            <li key={item.id} className="flex flex-wrap items-center gap-3 px-3 py-2 text-sm">
              <span className="font-mono text-xs">{item.accessionNumber}</span>
              <span className="flex-1 font-serif text-base">{item.title}</span>
              <Button disabled={restore.isPending} onClick={() => restore.mutate(item.id)}>
                Restore
              </Button>
            </li>
          ))}
        </ul>
      )}
      {total > 50 && <Pager page={page} pages={Math.ceil(total / 50)} onPage={setPage} />}
    </>
  );
}
