import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { Link, useLocation, useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { requiredText } from '@shared/schemas/common';
import { passwordSchema } from '@shared/schemas/people';
import { PublicPage } from '@/components/layout/public-page';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { useSignIn } from '@/lib/session';
import { accountQueries, tokenFromHash, useAcceptInvitation } from '../api/account-api';
import { NewPasswordFields, REPEAT_DIFFERS } from './new-password-fields';

const AcceptFormSchema = z
  .object({ name: requiredText(120, 'Name'), password: passwordSchema, repeat: z.string() })
  .refine((form) => form.password === form.repeat, REPEAT_DIFFERS);
type AcceptForm = z.infer<typeof AcceptFormSchema>;

/** Where an invitation link lands: choose a name and a password, then in you go. */
export function AcceptInvitationPage() {
  const token = tokenFromHash(useLocation().hash);
  const invitation = useQuery({ ...accountQueries.invitation(token), enabled: token !== '' });
  const accept = useAcceptInvitation(token);
  const signIn = useSignIn();
  const navigate = useNavigate();
  const form = useForm<AcceptForm>({
    resolver: zodResolver(AcceptFormSchema),
    defaultValues: { name: '', password: '', repeat: '' },
  });

  if (!token || invitation.isError) {
    return (
      <PublicPage title="This invitation link does not work">
        <p className="text-sm text-ink-soft">
          It may have been used already, revoked, or be more than seven days old. Ask the person who
          invited you to send a new one.
        </p>
        <p className="mt-3 text-sm">
          <Link to={paths.signIn}>Go to sign-in</Link>
        </p>
      </PublicPage>
    );
  }
  if (invitation.isPending) return <Loading />;
  const { email, role } = invitation.data;
  const submit = form.handleSubmit(({ name, password }) =>
    accept.mutate(
      { name, password },
      {
        onSuccess: () =>
          signIn.mutate({ email, password }, { onSuccess: () => navigate(paths.start) }),
      },
    ),
  );
  return (
    <PublicPage title="Join Printwarden">
      <p className="mb-4 text-sm text-ink-soft">
        You are invited as <strong>{role}</strong> with the address <strong>{email}</strong>.
      </p>
      <form onSubmit={submit} noValidate className="flex flex-col gap-3">
        <TextField
          label="Your name"
          autoComplete="name"
          {...form.register('name')}
          error={form.formState.errors.name?.message}
        />
        <NewPasswordFields
          label="Password"
          password={form.register('password')}
          repeat={form.register('repeat')}
          errors={{
            password: form.formState.errors.password?.message,
            repeat: form.formState.errors.repeat?.message,
          }}
        />
        <ErrorNotice error={accept.error ?? signIn.error} />
        <Button
          type="submit"
          tone="primary"
          disabled={accept.isPending || signIn.isPending}
          className="justify-center"
        >
          {accept.isPending || signIn.isPending ? 'Creating your account…' : 'Create my account'}
        </Button>
      </form>
    </PublicPage>
  );
}
