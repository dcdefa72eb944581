import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { ApiError } from '@/lib/api-client';
import { useChangePassword } from '../api/account-api';
import { passwordSchema } from '@shared/schemas/people';
import { NewPasswordFields, REPEAT_DIFFERS } from './new-password-fields';

const ChangeFormSchema = z
  .object({
    currentPassword: z.string().min(1, 'Enter your current password'),
    newPassword: passwordSchema,
    repeat: z.string(),
  })
  .refine((form) => form.newPassword === form.repeat, REPEAT_DIFFERS);
type ChangeForm = z.infer<typeof ChangeFormSchema>;

/** Your own password, for every signed-in role; other sessions end when it changes. */
export function ChangePasswordPage() {
  const change = useChangePassword();
  const form = useForm<ChangeForm>({
    resolver: zodResolver(ChangeFormSchema),
    defaultValues: { currentPassword: '', newPassword: '', repeat: '' },
  });
  const submit = form.handleSubmit(({ currentPassword, newPassword }) =>
    change.mutate({ currentPassword, newPassword }, { onSuccess: () => form.reset() }),
  );
  const wrongCurrent =
    change.error instanceof ApiError
      ? change.error.errors.find((e) => e.path === 'currentPassword')?.message
      : undefined;
  return (
    <>
      <PageHeader title="Your password" eyebrow="Account" />
      <form onSubmit={submit} noValidate className="flex max-w-md flex-col gap-3">
        <TextField
          label="Current password"
          type="password"
          autoComplete="current-password"
          {...form.register('currentPassword')}
          error={form.formState.errors.currentPassword?.message ?? wrongCurrent}
        />
        <NewPasswordFields
          label="New password"
          password={form.register('newPassword')}
          repeat={form.register('repeat')}
          errors={{
            password: form.formState.errors.newPassword?.message,
            repeat: form.formState.errors.repeat?.message,
          }}
        />
        {!wrongCurrent && <ErrorNotice error={change.error} />}
        {change.isSuccess && (
          <p role="status" className="text-sm text-ok">
            Password changed. Your sessions on other devices have ended.
          </p>
        )}
        <Button type="submit" tone="primary" disabled={change.isPending} className="justify-center">
          Change password
        </Button>
      </form>
    </>
  );
}
