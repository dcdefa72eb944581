import { ROLES, type Role } from '@shared/domain/roles';
import type { UserView } from '@shared/types/people';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notices';
import { useUpdateUser } from '../api/people-mutations';

const when = (iso: string | null) =>
  iso
    ? new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' })
    : 'never';

/** Everyone with an account: change a role, deactivate or reactivate. */
export function PeopleTable({ people, selfId }: { people: UserView[]; selfId: number }) {
  const update = useUpdateUser();
  return (
    <div className="flex flex-col gap-2">
      <ErrorNotice error={update.error} />
      <div className="overflow-x-auto rounded border border-paper-edge bg-white/60">
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
                    onChange={(event) =>
                      update.mutate({ id: person.id, body: { role: event.target.value as Role } })
                    }
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
                      update.mutate({ id: person.id, body: { active: !person.active } })
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
