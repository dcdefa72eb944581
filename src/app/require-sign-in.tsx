import { useDeferredValue } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { AppShell } from '@/components/layout/app-shell';
import { ErrorNotice } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { useSession } from '@/lib/session';
import { Opening } from './opening';

/** Everything but the sign-in page needs a session; without one, go and sign in. */
export function RequireSignIn() {
  const session = useSession();
  const location = useLocation();
  // The session's answer comes through a store React must draw at once, in one task: the
  // header and the whole first page were one long task (up to a quarter of a second on a
  // slowed phone). Deferred, "Opening Printwarden…" stays a moment longer and the shell and
  // page are drawn in a background render that React splits into slices of a few ms.
  const answered = useDeferredValue(!session.isPending, false);
  if (!answered || session.isPending) return <Opening />;
  if (session.error) return <ErrorNotice error={session.error} className="m-6" />;
  if (!session.data) {
    return (
      <Navigate to={paths.signIn} replace state={{ from: location.pathname + location.search }} />
    );
  }
  return (
    <AppShell session={session.data}>
      <Outlet />
    </AppShell>
  );
}
