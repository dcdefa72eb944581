import { useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

interface DemoInfo {
  demo: boolean;
  password?: string;
  accounts?: Array<{ email: string; role: string }>;
}

/** In demo mode the server names the demo accounts; elsewhere this shows nothing. */
export function DemoAccounts({ onPick }: { onPick: (email: string, password: string) => void }) {
  const { data } = useQuery({ queryKey: ['demo-accounts'], queryFn: () => api<DemoInfo>('/demo') });
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
