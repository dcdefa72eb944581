import { useState } from 'react';
import { formatDate } from '@shared/domain/format';
import type { InvitationView } from '@shared/types/people';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorNotice } from '@/components/ui/notices';
import { useResendInvitation, useRevokeInvitation } from '../api/people-mutations';

/** What the link of an invitation does now: only an open one has a date it works until. */
function linkState(invitation: InvitationView): string {
  switch (invitation.state) {
    case 'open':
      return `works until ${formatDate(invitation.expiresAt)}`;
    case 'expired':
      return `expired ${formatDate(invitation.expiresAt)}`;
    case 'revoked':
      return 'no longer works (revoked)';
    case 'accepted':
      return 'used: the account exists';
  }
}

/** Invitations, open ones first: resend a fresh link or revoke it (after a question). */
export function InvitationsTable({ invitations }: { invitations: InvitationView[] }) {
  const resend = useResendInvitation();
  const revoke = useRevokeInvitation();
  const [revoking, setRevoking] = useState<InvitationView | null>(null);
  const [said, setSaid] = useState<string | null>(null);
  if (invitations.length === 0) {
    return <p className="text-sm text-ink-faint">No invitations yet.</p>;
  }
  const sorted = [...invitations].sort(
    (a, b) => Number(b.state === 'open') - Number(a.state === 'open'),
  );
  return (
    <div className="flex flex-col gap-2">
      <ErrorNotice error={resend.error ?? revoke.error} />
      {said && (
        <p role="status" className="rounded border border-ok bg-ok-light px-3 py-2 text-sm">
          {said}
        </p>
      )}
      <ConfirmDialog
        open={revoking !== null}
        title={`Revoke the invitation to ${revoking?.email ?? ''}?`}
        confirmLabel="Revoke"
        danger
        onCancel={() => setRevoking(null)}
        onConfirm={() => {
          const invitation = revoking!;
          setRevoking(null);
          setSaid(null);
          revoke.mutate(invitation.id, {
            onSuccess: () =>
              setSaid(
                `The invitation to ${invitation.email} is revoked: its link no longer works.`,
              ),
          });
        }}
      >
        The link in the e-mail stops working at once. You can invite the address again later.
      </ConfirmDialog>
      <div className="relative overflow-x-auto rounded border border-paper-edge bg-white/60">
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
                Link
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
                <td className="px-3 py-1.5 whitespace-nowrap">{linkState(invitation)}</td>
                <td className="px-3 py-1.5 text-right whitespace-nowrap">
                  {(invitation.state === 'open' || invitation.state === 'expired') && (
                    <Button
                      className="px-2 py-0.5 text-xs"
                      disabled={resend.isPending}
                      aria-label={`Resend the invitation to ${invitation.email}`}
                      onClick={() => {
                        setSaid(null);
                        resend.mutate(invitation.id, {
                          onSuccess: () =>
                            setSaid(
                              `A new link went to ${invitation.email}; it works for seven days, and the earlier one no longer does.`,
                            ),
                        });
                      }}
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
                      onClick={() => setRevoking(invitation)}
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
