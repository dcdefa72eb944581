import { Link } from 'react-router-dom';
import type { SessionResponse } from '@shared/types/catalogue';
import { paths } from '@/config/paths';
import { useSignOut } from '@/lib/session';

/** Who is signed in (a link to their password page) and the sign-out button. */
export function AccountLinks({
  session,
  onPick,
}: {
  session: SessionResponse;
  onPick?: () => void;
}) {
  const signOut = useSignOut();
  return (
    <div className="flex items-center gap-3 text-sm">
      <Link
        to={paths.account}
        onClick={onPick}
        className="text-ink no-underline hover:underline"
        title="Your password"
      >
        <span className="hidden lg:inline">{session.user.name} · </span>
        <span className="text-ink-faint">{session.user.role}</span>
      </Link>
      <button
        type="button"
        className="min-h-9 rounded border border-paper-edge px-2 py-1 text-sm whitespace-nowrap hover:bg-paper-edge/60"
        onClick={() => {
          onPick?.();
          signOut.mutate();
        }}
      >
        Sign out
      </button>
    </div>
  );
}
