import { useState, type FormEvent } from 'react';
import { Link, Navigate, useLocation, useNavigate } from 'react-router-dom';
import type { SignInInput } from '@shared/schemas/session';
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
  const from = (useLocation().state as { from?: string } | null)?.from ?? paths.start;
  // Two fields: the shared schema checks them directly, without a form library, and it (with
  // zod, about 25 kB compressed) loads only when the form is sent, so the first page anyone
  // opens stays light (issue 20: at most 150 kB of compressed script).
  const [values, setValues] = useState<SignInInput>({ email: '', password: '' });
  const [errors, setErrors] = useState<Partial<Record<keyof SignInInput, string>>>({});

  if (session.data) return <Navigate to={from} replace />;
  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const onSuccess = () => navigate(from, { replace: true });
    // A page left open across a new release asks for a file that is gone: the server, which
    // checks with the same schema, then names what is wrong instead.
    const schema = await import('@shared/schemas/session').catch(() => undefined);
    if (!schema) return signIn.mutate(values, { onSuccess });
    const result = schema.SignInSchema.safeParse(values);
    if (!result.success) {
      const found: Partial<Record<keyof SignInInput, string>> = {};
      for (const issue of result.error.issues) {
        const field = issue.path[0] as keyof SignInInput;
        found[field] ??= issue.message;
      }
      setErrors(found);
      return;
    }
    setErrors({});
    signIn.mutate(result.data, { onSuccess });
  };
  const field = (name: keyof SignInInput) => ({
    name,
    value: values[name],
    onChange: (event: { target: { value: string } }) =>
      setValues((current) => ({ ...current, [name]: event.target.value })),
    error: errors[name],
  });

  return (
    <main className="mx-auto flex min-h-screen max-w-4xl flex-col gap-10 px-6 pt-[12vh] pb-10 md:flex-row md:items-start">
      {/* Side by side the two halves share the width (md:flex-1); stacked, each is as tall as
          its content: growing into the screen's height, the motto's half shrank when the demo
          accounts arrived and moved the form up. */}
      <section className="md:flex-1">
        <h1 className="text-5xl font-medium">Printwarden</h1>
        <p className="mt-3 max-w-sm font-serif text-lg text-ink-soft italic">
          How each print was made, where it is, what it looks like, and whether it is changing.
        </p>
      </section>
      <section className="rounded-lg border border-paper-edge bg-white/70 p-6 shadow-sm md:flex-1">
        <h2 className="mb-4 text-2xl">Sign in</h2>
        <form onSubmit={submit} noValidate className="flex flex-col gap-3">
          <TextField label="E-mail" type="email" autoComplete="username" {...field('email')} />
          <TextField
            label="Password"
            type="password"
            autoComplete="current-password"
            {...field('password')}
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
        <DemoAccounts onPick={(email, password) => setValues({ email, password })} />
      </section>
    </main>
  );
}
