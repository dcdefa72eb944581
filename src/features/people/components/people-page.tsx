import { useQuery } from '@tanstack/react-query';
import { isForbidden, NoAccess } from '@/components/ui/no-access';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { useCan, useSession } from '@/lib/session';
import { peopleQueries } from '../api/people-queries';
import { InvitationsTable } from './invitations-table';
import { InviteForm } from './invite-form';
import { PeopleTable } from './people-table';

/** People (admin): who has an account, their roles, and invitations. */
export function PeoplePage() {
  const session = useSession();
  const can = useCan();
  const allowed = can('users:manage');
  const users = useQuery({ ...peopleQueries.users(), enabled: allowed });
  const invitations = useQuery({ ...peopleQueries.invitations(), enabled: allowed });
  if (!allowed || isForbidden(users.error)) {
    return (
      <>
        <PageHeader title="People" eyebrow="Accounts and invitations" />
        <NoAccess area="People and invitations" needs="users:manage" />
      </>
    );
  }
  return (
    <>
      <PageHeader title="People" eyebrow="Accounts and invitations" />
      <p className="mb-4 max-w-prose text-sm text-ink-soft">
        A deactivated person is signed out at once and can no longer sign in; their name stays in
        the history of every record they changed. There is always at least one active admin.
      </p>
      <div className="flex flex-col gap-6">
        <InviteForm invitations={invitations.data} />
        <section aria-labelledby="people-heading">
          <h2 id="people-heading" className="mb-2 text-xl">
            Accounts
          </h2>
          {users.isPending ? <Loading /> : <ErrorNotice error={users.error} />}
          {users.data && <PeopleTable people={users.data} selfId={session.data?.user.id ?? 0} />}
        </section>
        <section aria-labelledby="invitations-heading">
          <h2 id="invitations-heading" className="mb-2 text-xl">
            Invitations
          </h2>
          {invitations.isPending ? <Loading /> : <ErrorNotice error={invitations.error} />}
          {invitations.data && <InvitationsTable invitations={invitations.data} />}
        </section>
      </div>
    </>
  );
}
