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
  if (session.isPending) return <Opening />;
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
