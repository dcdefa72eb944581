import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link, Navigate, useLocation, useNavigate } from 'react-router-dom';
import { SignInSchema, type SignInInput } from '@shared/schemas/session';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { useSession, useSignIn } from '@/lib/session';
import { DemoAccounts } from './demo-accounts';

export function SignInPage() {
  const session = useSession();
  const signIn = useSignIn();
  const navigate = useNavigate();
  const from = (useLocation().state as { from?: string } | null)?.from ?? paths.prints;
  const form = useForm<SignInInput>({
    resolver: zodResolver(SignInSchema),
    defaultValues: { email: '', password: '' },
  });

  if (session.data) return <Navigate to={from} replace />;
  const submit = form.handleSubmit((input) =>
    signIn.mutate(input, { onSuccess: () => navigate(from, { replace: true }) }),
  );

  return (
    <main className="mx-auto flex min-h-screen max-w-4xl flex-col justify-center gap-10 px-6 py-10 md:flex-row md:items-center">
      <section className="flex-1">
        <h1 className="text-5xl font-medium">Printwarden</h1>
        <p className="mt-3 max-w-sm font-serif text-lg text-ink-soft italic">
          How each print was made, where it is, what it looks like, and whether it is changing.
        </p>
      </section>
      <section className="flex-1 rounded-lg border border-paper-edge bg-white/70 p-6 shadow-sm">
        <h2 className="mb-4 text-2xl">Sign in</h2>
        <form onSubmit={submit} noValidate className="flex flex-col gap-3">
          <TextField
            label="E-mail"
            type="email"
            autoComplete="username"
            {...form.register('email')}
            error={form.formState.errors.email?.message}
          />
          <TextField
            label="Password"
            type="password"
            autoComplete="current-password"
            {...form.register('password')}
            error={form.formState.errors.password?.message}
          />
          <ErrorNotice error={signIn.error} />
          <Button
            type="submit"
            tone="primary"
            disabled={signIn.isPending}
            className="justify-center"
          >
            {signIn.isPending ? 'Signing in…' : 'Sign in'}
          </Button>
          <Link to={paths.forgotPassword} className="text-sm">
            Forgotten your password?
          </Link>
        </form>
        <DemoAccounts
          onPick={(email, password) => {
            form.setValue('email', email);
            form.setValue('password', password);
          }}
        />
      </section>
    </main>
  );
}
