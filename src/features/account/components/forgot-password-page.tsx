import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { PasswordResetRequestSchema, type PasswordResetRequestInput } from '@shared/schemas/people';
import { PublicPage } from '@/components/layout/public-page';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { useRequestPasswordReset } from '../api/account-api';

/** Ask for a reset link; the answer is the same whether or not the address is known. */
export function ForgotPasswordPage() {
  const request = useRequestPasswordReset();
  const form = useForm<PasswordResetRequestInput>({
    resolver: zodResolver(PasswordResetRequestSchema),
    defaultValues: { email: '' },
  });
  const submit = form.handleSubmit((input) => request.mutate(input));
  return (
    <PublicPage title="Forgotten password">
      {request.isSuccess ? (
        <p role="status" className="text-sm">
          If this address has an account, a link to choose a new password is on its way. It works
          once, within the hour.
        </p>
      ) : (
        <form onSubmit={submit} noValidate className="flex flex-col gap-3">
          <p className="text-sm text-ink-soft">
            Give the address you sign in with; we will e-mail a link to choose a new password.
          </p>
          <TextField
            label="E-mail"
            type="email"
            autoComplete="username"
            {...form.register('email')}
            error={form.formState.errors.email?.message}
          />
          <ErrorNotice error={request.error} />
          <Button
            type="submit"
            tone="primary"
            disabled={request.isPending}
            className="justify-center"
          >
            Send the link
          </Button>
        </form>
      )}
      <p className="mt-4 text-sm">
        <Link to={paths.signIn}>Back to sign-in</Link>
      </p>
    </PublicPage>
  );
}
