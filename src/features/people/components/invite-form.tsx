import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { formatDate } from '@shared/domain/format';
import { ROLES } from '@shared/domain/roles';
import { InvitationCreateSchema, type InvitationCreateInput } from '@shared/schemas/people';
import type { InvitationView } from '@shared/types/people';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { useInviteUser } from '../api/people-mutations';

const roleOptions = ROLES.map((role) => ({ value: role, label: role }));

/** Invite a colleague: an e-mail with a one-time link, valid seven days. */
export function InviteForm({ invitations = [] }: { invitations?: InvitationView[] }) {
  const invite = useInviteUser();
  const form = useForm<InvitationCreateInput>({
    resolver: zodResolver(InvitationCreateSchema),
    defaultValues: { email: '', role: 'viewer' },
  });
  // Inviting an address again revokes its open invitation: ask first, and say so after.
  const [asking, setAsking] = useState<{
    input: InvitationCreateInput;
    open: InvitationView;
  } | null>(null);
  const [replaced, setReplaced] = useState(false);
  const send = (input: InvitationCreateInput, replacing: boolean) =>
    invite.mutate(input, {
      onSuccess: () => {
        setReplaced(replacing);
        form.reset({ email: '', role: input.role });
      },
    });
  const submit = form.handleSubmit((input) => {
    const open = invitations.find(
      (invitation) =>
        invitation.state === 'open' &&
        invitation.email.toLowerCase() === input.email.trim().toLowerCase(),
    );
    if (open) setAsking({ input, open });
    else send(input, false);
  });
  const serverError = (path: string) => {
    const error = invite.error as { errors?: Array<{ path: string; message: string }> } | null;
    return error?.errors?.find((item) => item.path === path)?.message;
  };
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="invite-heading"
      className="rounded border border-paper-edge bg-paper-deep/60 p-3"
    >
      <h2 id="invite-heading" className="mb-2 text-xl">
        Invite a colleague
      </h2>
      <ConfirmDialog
        open={asking !== null}
        title={`${asking?.open.email ?? ''} already has an open invitation`}
        confirmLabel="Send a new invitation"
        onCancel={() => setAsking(null)}
        onConfirm={() => {
          const { input } = asking!;
          setAsking(null);
          send(input, true);
        }}
      >
        It was sent on {formatDate(asking?.open.createdAt)} as {asking?.open.role}. A new invitation
        revokes it: only the new link will work.
      </ConfirmDialog>
      <div className="grid items-start gap-3 sm:grid-cols-[2fr_1fr_auto]">
        <TextField
          label="E-mail"
          type="email"
          autoComplete="off"
          {...form.register('email')}
          error={form.formState.errors.email?.message ?? serverError('email')}
        />
        <SelectField
          label="Role"
          options={roleOptions}
          {...form.register('role')}
          error={form.formState.errors.role?.message}
        />
        <Button type="submit" tone="primary" disabled={invite.isPending} className="sm:mt-5">
          {invite.isPending ? 'Sending…' : 'Send invitation'}
        </Button>
      </div>
      {invite.isSuccess && (
        <p role="status" className="mt-2 text-sm text-ok">
          Invitation sent to {invite.data.email}. The link works once, for seven days.
          {replaced &&
            ' The earlier invitation to this address is revoked: its link no longer works.'}
        </p>
      )}
      {invite.error && !serverError('email') && (
        <ErrorNotice error={invite.error} className="mt-2" />
      )}
    </form>
  );
}
