import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { ROLES } from '@shared/domain/roles';
import { InvitationCreateSchema, type InvitationCreateInput } from '@shared/schemas/people';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { useInviteUser } from '../api/people-mutations';

const roleOptions = ROLES.map((role) => ({ value: role, label: role }));

/** Invite a colleague: an e-mail with a one-time link, valid seven days. */
export function InviteForm() {
  const invite = useInviteUser();
  const form = useForm<InvitationCreateInput>({
    resolver: zodResolver(InvitationCreateSchema),
    defaultValues: { email: '', role: 'viewer' },
  });
  const submit = form.handleSubmit((input) =>
    invite.mutate(input, { onSuccess: () => form.reset({ email: '', role: input.role }) }),
  );
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
        </p>
      )}
      {invite.error && !serverError('email') && (
        <ErrorNotice error={invite.error} className="mt-2" />
      )}
    </form>
  );
}
