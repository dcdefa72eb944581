import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { formatDateTime } from '@shared/domain/format';
import { ROLES, type Role } from '@shared/domain/roles';
import type { UserView } from '@shared/types/people';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorNotice } from '@/components/ui/notices';
import { setCsrfToken } from '@/lib/api-client';
import { sessionQueries } from '@/lib/session';
import { useUpdateUser } from '../api/people-mutations';

const when = (iso: string | null) => (iso ? formatDateTime(iso) : 'never');

/** Everyone with an account: change a role, deactivate (after a question) or reactivate. */
export function PeopleTable({ people, selfId }: { people: UserView[]; selfId: number }) {
  const update = useUpdateUser();
  const queryClient = useQueryClient();
  const [leaving, setLeaving] = useState<UserView | null>(null);
  const leavingSelf = leaving !== null && leaving.id === selfId;
  /** The server has ended this person's sessions: the app shows the sign-in page. */
  const signedOut = () => {
    setCsrfToken(null);
    queryClient.setQueryData(sessionQueries.current().queryKey, null);
  };
  const [said, setSaid] = useState<string | null>(null);
  const change = (person: UserView, body: { role?: Role; active?: boolean }, done: string) => {
    setSaid(null);
    update.mutate({ id: person.id, body }, { onSuccess: () => setSaid(done) });
  };
  return (
    <div className="flex flex-col gap-2">
      <ErrorNotice error={update.error} />
      {said && (
        <p role="status" className="rounded border border-ok bg-ok-light px-3 py-2 text-sm">
          {said}
        </p>
      )}
      <ConfirmDialog
        open={leaving !== null}
        title={leavingSelf ? 'Deactivate your own account?' : `Deactivate ${leaving?.name ?? ''}?`}
        confirmLabel={leavingSelf ? 'Deactivate my account' : 'Deactivate'}
        danger
        onCancel={() => setLeaving(null)}
        onConfirm={() => {
          const person = leaving!;
          setLeaving(null);
          if (person.id === selfId) {
            update.mutate({ id: person.id, body: { active: false } }, { onSuccess: signedOut });
            return;
          }
          change(
            person,
            { active: false },
            `${person.name} is deactivated: signed out everywhere and unable to sign in.`,
          );
        }}
      >
        {leavingSelf ? (
          <>
            You will be signed out straight away, on every device. You cannot sign in again until
            another admin reactivates your account on this page. Your name stays in the history of
            every record you changed.
          </>
        ) : (
          <>
            {leaving?.name} is signed out at once, on every device, and cannot sign in until an
            admin reactivates them here. Their name stays in the history of every record they
            changed.
          </>
        )}
      </ConfirmDialog>
      <div className="relative overflow-x-auto rounded border border-paper-edge bg-white/60">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">People with an account</caption>
          <thead className="bg-paper-deep text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              <th scope="col" className="px-3 py-2 font-semibold">
                Name
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                E-mail
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Role
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Last sign-in
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Account
              </th>
            </tr>
          </thead>
          <tbody>
            {people.map((person) => (
              <tr key={person.id} className="border-t border-paper-edge/70">
                <td className="px-3 py-1.5 font-serif text-base">
                  {person.name}
                  {person.id === selfId && <span className="text-ink-faint"> (you)</span>}
                </td>
                <td className="px-3 py-1.5">{person.email}</td>
                <td className="px-3 py-1.5">
                  <select
                    aria-label={`Role of ${person.name}`}
                    value={person.role}
                    disabled={update.isPending}
                    onChange={(event) => {
                      const role = event.target.value as Role;
                      change(
                        person,
                        { role },
                        `${person.name} is now ${role === 'admin' || role === 'archivist' ? 'an' : 'a'} ${role}.`,
                      );
                    }}
                    className="rounded border border-paper-edge bg-white px-1.5 py-1 text-sm"
                  >
                    {ROLES.map((role) => (
                      <option key={role} value={role}>
                        {role}
                      </option>
                    ))}
                  </select>
                </td>
                <td className="px-3 py-1.5 whitespace-nowrap">{when(person.lastSignInAt)}</td>
                <td className="px-3 py-1.5 whitespace-nowrap">
                  <span className={person.active ? 'text-ok' : 'text-alert'}>
                    {person.active ? 'active' : 'deactivated'}
                  </span>{' '}
                  <Button
                    tone={person.active ? 'danger' : 'quiet'}
                    className="ml-2 px-2 py-0.5 text-xs"
                    disabled={update.isPending}
                    aria-label={`${person.active ? 'Deactivate' : 'Reactivate'} ${person.name}`}
                    onClick={() =>
                      person.active
                        ? setLeaving(person)
                        : change(person, { active: true }, `${person.name} can sign in again.`)
                    }
                  >
                    {person.active ? 'Deactivate' : 'Reactivate'}
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
