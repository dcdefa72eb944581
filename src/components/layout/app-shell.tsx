import clsx from 'clsx';
import type { ReactNode } from 'react';
import { NavLink, useNavigate } from 'react-router-dom';
import type { Ability } from '@shared/domain/roles';
import type { SessionResponse } from '@shared/types/catalogue';
import { paths } from '@/config/paths';
import { useSignOut } from '@/lib/session';

interface Area {
  to: string;
  label: string;
  needs: Ability;
}

/** Only areas that work today are listed, each for the roles that may use it (design §5). */
const AREAS: Area[] = [
  { to: paths.prints, label: 'Prints', needs: 'catalogue:read' },
  { to: paths.search, label: 'Search', needs: 'catalogue:read' },
  { to: paths.checklists, label: 'Checklists', needs: 'searches:save' },
  { to: paths.papers, label: 'Papers', needs: 'catalogue:read' },
  { to: paths.negatives, label: 'Negatives', needs: 'catalogue:read' },
  { to: paths.places, label: 'Places', needs: 'locations:read' },
  { to: paths.chemistry, label: 'Chemistry', needs: 'catalogue:read' },
  { to: paths.toneWatch, label: 'Tone watch', needs: 'tone:write' },
  { to: paths.insights, label: 'Insights', needs: 'catalogue:read' },
  { to: paths.settings, label: 'Settings', needs: 'settings:read' },
  { to: paths.people, label: 'People', needs: 'users:manage' },
  { to: paths.outbox, label: 'Outbox', needs: 'outbox:read' },
  { to: paths.fixity, label: 'Fixity', needs: 'fixity:run' },
  { to: paths.imports, label: 'Imports', needs: 'imports:write' },
];

export function AppShell({ session, children }: { session: SessionResponse; children: ReactNode }) {
  const signOut = useSignOut();
  const navigate = useNavigate();
  const areas = AREAS.filter((area) => session.abilities.includes(area.needs));
  return (
    <div className="min-h-screen">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:p-2 print:hidden">
        Skip to content
      </a>
      <header className="border-b border-paper-edge bg-paper-deep print:hidden">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <NavLink
            to={paths.prints}
            className="font-serif text-2xl font-semibold text-ink no-underline"
          >
            Printwarden
          </NavLink>
          <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
            {areas.map((area) => (
              <NavLink
                key={area.to}
                to={area.to}
                className={({ isActive }) =>
                  clsx(
                    'rounded px-3 py-1.5 text-sm no-underline',
                    isActive ? 'bg-gall text-paper' : 'text-ink hover:bg-paper-edge/60',
                  )
                }
              >
                {area.label}
              </NavLink>
            ))}
          </nav>
          <div className="flex items-center gap-3 text-sm">
            <NavLink
              to={paths.account}
              className="text-ink no-underline hover:underline"
              title="Your password"
            >
              <span className="hidden lg:inline">{session.user.name} · </span>
              <span className="text-ink-faint">{session.user.role}</span>
            </NavLink>
            <button
              type="button"
              className="rounded border border-paper-edge px-2 py-1 text-sm hover:bg-paper-edge/60"
              onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.signIn) })}
            >
              Sign out
            </button>
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-7xl px-4 py-6">
        {children}
      </main>
    </div>
  );
}
