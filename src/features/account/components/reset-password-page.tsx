import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link, useLocation } from 'react-router-dom';
import { z } from 'zod';
import { passwordSchema } from '@shared/schemas/people';
import { PublicPage } from '@/components/layout/public-page';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { tokenFromHash, useResetPassword } from '../api/account-api';
import { NewPasswordFields, REPEAT_DIFFERS } from './new-password-fields';

const ResetFormSchema = z
  .object({ password: passwordSchema, repeat: z.string() })
  .refine((form) => form.password === form.repeat, REPEAT_DIFFERS);
type ResetForm = z.infer<typeof ResetFormSchema>;

/** Where a reset link lands: a new password, once. */
export function ResetPasswordPage() {
  const token = tokenFromHash(useLocation().hash);
  const reset = useResetPassword(token);
  const form = useForm<ResetForm>({
    resolver: zodResolver(ResetFormSchema),
    defaultValues: { password: '', repeat: '' },
  });
  const submit = form.handleSubmit(({ password }) => reset.mutate({ password }));
  if (reset.isSuccess) {
    return (
      <PublicPage title="Password changed">
        <p role="status" className="text-sm">
          Your new password is set, and every session with the old one has ended.
        </p>
        <p className="mt-3 text-sm">
          <Link to={paths.signIn}>Sign in</Link>
        </p>
      </PublicPage>
    );
  }
  return (
    <PublicPage title="Choose a new password">
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <NewPasswordFields
          label="New password"
          password={form.register('password')}
          repeat={form.register('repeat')}
          errors={{
            password: form.formState.errors.password?.message,
            repeat: form.formState.errors.repeat?.message,
          }}
        />
        <ErrorNotice error={reset.error} />
        {reset.error && (
          <p className="text-sm">
            <Link to={paths.forgotPassword}>Ask for a new link</Link>
          </p>
        )}
        <Button
          type="submit"
          tone="primary"
          disabled={reset.isPending || !token}
          className="justify-center"
        >
          Set the new password
        </Button>
      </form>
    </PublicPage>
  );
}
