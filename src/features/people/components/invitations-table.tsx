import type { InvitationView } from '@shared/types/people';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notices';
import { useResendInvitation, useRevokeInvitation } from '../api/people-mutations';

const day = (iso: string) => new Date(iso).toLocaleDateString(undefined, { dateStyle: 'medium' });

/** Invitations, open ones first: resend a fresh link or revoke it. */
export function InvitationsTable({ invitations }: { invitations: InvitationView[] }) {
  const resend = useResendInvitation();
  const revoke = useRevokeInvitation();
  if (invitations.length === 0) {
    return <p className="text-sm text-ink-faint">No invitations yet.</p>;
  }
  const sorted = [...invitations].sort(
    (a, b) => Number(b.state === 'open') - Number(a.state === 'open'),
  );
  return (
    <div className="flex flex-col gap-2">
      <ErrorNotice error={resend.error ?? revoke.error} />
      <div className="overflow-x-auto rounded border border-paper-edge bg-white/60">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Invitations</caption>
          <thead className="bg-paper-deep text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              <th scope="col" className="px-3 py-2 font-semibold">
                E-mail
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Role
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                State
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Link valid until
              </th>
              <th scope="col" className="px-3 py-2">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {sorted.map((invitation) => (
              <tr key={invitation.id} className="border-t border-paper-edge/70">
                <td className="px-3 py-1.5">{invitation.email}</td>
                <td className="px-3 py-1.5">{invitation.role}</td>
                <td className="px-3 py-1.5">{invitation.state}</td>
                <td className="px-3 py-1.5 whitespace-nowrap">{day(invitation.expiresAt)}</td>
                <td className="px-3 py-1.5 text-right whitespace-nowrap">
                  {(invitation.state === 'open' || invitation.state === 'expired') && (
                    <Button
                      className="px-2 py-0.5 text-xs"
                      disabled={resend.isPending}
                      aria-label={`Resend the invitation to ${invitation.email}`}
                      onClick={() => resend.mutate(invitation.id)}
                    >
                      Resend
                    </Button>
                  )}{' '}
                  {invitation.state === 'open' && (
                    <Button
                      tone="danger"
                      className="px-2 py-0.5 text-xs"
                      disabled={revoke.isPending}
                      aria-label={`Revoke the invitation to ${invitation.email}`}
                      onClick={() => revoke.mutate(invitation.id)}
                    >
                      Revoke
                    </Button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
