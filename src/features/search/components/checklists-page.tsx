import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { checklistQueries } from '../api/search-queries';

/** Every checklist, most recently changed first; new ones are made from Search. */
export function ChecklistsPage() {
  const checklists = useQuery(checklistQueries.list());
  return (
    <>
      <PageHeader
        title="Checklists"
        eyebrow="Exhibitions and loans"
        actions={<ButtonLink to={paths.search}>Pick prints in Search</ButtonLink>}
      />
      <ErrorNotice error={checklists.error} />
      {checklists.isPending ? (
        <Loading label="Loading checklists…" />
      ) : checklists.data?.length ? (
        <ul className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/60">
          {checklists.data.map((checklist) => (
            <li key={checklist.id} className="flex items-baseline justify-between gap-3 px-3 py-2">
              <Link to={paths.checklist(checklist.id)} className="font-serif text-lg text-ink">
                {checklist.name}
              </Link>
              <span className="text-sm text-ink-soft">
                {checklist.printIds.length === 1
                  ? '1 print'
                  : `${checklist.printIds.length} prints`}{' '}
                · changed {new Date(checklist.updatedAt).toLocaleDateString()}
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
