import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

interface DemoInfo {
  demo: boolean;
  /** No active account exists yet: the first admin is made on the server's command line. */
  firstRun?: boolean;
  password?: string;
  accounts?: Array<{ email: string; role: string }>;
}

/**
 * In demo mode the server names the demo accounts; on a fresh install with no account yet,
 * how to make the first admin; otherwise nothing.
 */
export function DemoAccounts({ onPick }: { onPick: (email: string, password: string) => void }) {
  const { data } = useQuery({ queryKey: ['demo-accounts'], queryFn: () => api<DemoInfo>('/demo') });
  if (data?.firstRun) return <FirstRunHelp />;
  if (!data?.demo || !data.accounts || !data.password) return null;
  const password = data.password;
  return (
    <div className="mt-6 border-t border-paper-edge pt-4 text-sm">
      <h3 className="mb-1 font-sans text-xs font-semibold tracking-wide text-ink-soft uppercase">
        Demo accounts
      </h3>
      <p className="mb-2 text-xs text-ink-faint">
        Password for all: <code className="rounded bg-paper-deep px-1">{password}</code>
      </p>
      <ul className="grid gap-1">
        {data.accounts.map((account) => (
          <li key={account.email}>
            <button
              type="button"
              className="text-left text-gall underline underline-offset-2 hover:text-gall-dark"
              onClick={() => onPick(account.email, password)}
            >
              {account.email}
            </button>{' '}
            <span className="text-ink-faint">({account.role})</span>
          </li>
        ))}
      </ul>
    </div>
  );
}

function FirstRunHelp() {
  return (
    <div className="mt-6 border-t border-paper-edge pt-4 text-sm" role="note">
      <h3 className="mb-1 font-serif text-base text-ink">No accounts yet</h3>
      <p className="mb-2 text-ink-soft">
        This archive has no one who can sign in. Whoever runs the server makes the first
        administrator there, in the project folder:
      </p>
      <pre className="overflow-x-auto rounded bg-paper-deep px-2 py-1 text-xs">
        npm run create-admin
      </pre>
      <p className="mt-2 text-ink-soft">
        It asks for an e-mail address, a name and a password. That administrator then invites
        everyone else from People.
      </p>
    </div>
  );
}
