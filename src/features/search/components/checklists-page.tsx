import { formatCount, formatDate } from '@shared/domain/format';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { isForbidden, NoAccess } from '@/components/ui/no-access';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { checklistQueries } from '../api/search-queries';

/** Every checklist, most recently changed first; new ones are made from Search. */
export function ChecklistsPage() {
  const checklists = useQuery(checklistQueries.list());
  if (isForbidden(checklists.error)) {
    return (
      <>
        <PageHeader title="Checklists" eyebrow="Exhibitions and loans" />
        <NoAccess area="Checklists" needs="searches:save" />
      </>
    );
  }
  return (
    <>
      <PageHeader
        title="Checklists"
        eyebrow="Exhibitions and loans"
        actions={<ButtonLink to={paths.search}>Pick prints in Search</ButtonLink>}
      />
      <ErrorNotice error={checklists.error} />
      {checklists.error ? null : checklists.isPending ? (
        <Loading label="Loading checklists…" />
      ) : checklists.data?.length ? (
        <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/60">
          {checklists.data.map((checklist) => (
            <li key={checklist.id} className="flex items-baseline justify-between gap-3 px-3 py-2">
              <Link to={paths.checklist(checklist.id)} className="font-serif text-lg text-ink">
                {checklist.name}
              </Link>
              <span className="text-sm text-ink-soft">
                {formatCount(checklist.printIds.length, 'print')} · changed{' '}
                {formatDate(checklist.updatedAt)}
              </span>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-ink-soft">
          No checklists yet. Find prints in Search, pick them, and add them to a new checklist.
        </p>
      )}
    </>
  );
}
