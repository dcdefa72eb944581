import { useQuery } from '@tanstack/react-query';
import type { Role } from '@shared/domain/roles';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { useSession } from '@/lib/session';
import { overviewQueries } from '@/lib/overview-queries';
import { OverviewCard } from './overview-card';

/** What each role's start page is about, in a line. */
const INTRO: Record<Role, string> = {
  conservator: 'Checks falling due, alerts, and prints whose tone has moved.',
  archivist: 'New accessions, images in hand, imports, and processing to look into.',
  curator: 'Your saved searches, the checklists, and the loans and shows under way.',
  admin: 'Mail, people, stored files and backups.',
  viewer: 'What has come into the collection lately.',
};

/** The page everyone lands on after signing in: a few counts for their job, each a way in. */
export function StartPage() {
  const session = useSession();
  const overview = useQuery(overviewQueries.mine());
  const role = session.data?.user.role;
  return (
    <>
      <PageHeader title="Today" eyebrow={session.data ? session.data.user.name : undefined} />
      {role && <p className="mb-4 text-sm text-ink-soft">{INTRO[role]}</p>}
      <ErrorNotice error={overview.error} />
      {overview.isPending ? (
        <Loading label="Counting…" />
      ) : (
        <ul aria-label="At a glance" className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {overview.data?.items.map((item) => (
            <OverviewCard key={item.kind} item={item} />
          ))}
        </ul>
      )}
    </>
  );
}
