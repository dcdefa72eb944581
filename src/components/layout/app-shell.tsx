import { Suspense, type ReactNode } from 'react';
import { Link, useLocation, useNavigation } from 'react-router-dom';
import type { SessionResponse } from '@shared/types/catalogue';
import { Loading } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { AccountLinks } from './account-links';
import { currentArea, groupsFor } from './areas';
import { CompactMenu } from './compact-menu';
import { GroupMenu } from './group-menu';
import { useStackedTableLabels } from './use-stacked-table-labels';

/**
 * The signed-in page: skip link, header, main. From 768 px the header shows the role's
 * headings (each opens its areas); below, one button names the current area and opens them all.
 */
export function AppShell({ session, children }: { session: SessionResponse; children: ReactNode }) {
  const groups = groupsFor(session.abilities);
  const location = useLocation();
  const here = currentArea(groups, location.pathname);
  const main = useStackedTableLabels();
  // While the next page's code loads, the old page stays on screen but cannot be used (no
  // pointer, no keys): a click on it would land on a page that is already being left. Changes of the query alone
  // (typing in a search) are not a new page and keep the page as it is.
  const navigation = useNavigation();
  const leaving =
    navigation.state !== 'idle' &&
    navigation.location !== undefined &&
    navigation.location.pathname !== location.pathname;
  return (
    <div className="min-h-screen">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:z-40 focus:bg-paper focus:p-2 print:hidden"
      >
        Skip to content
      </a>
      <header className="relative border-b border-paper-edge bg-paper-deep print:hidden">
        <div className="mx-auto flex max-w-7xl items-center justify-between gap-x-3 px-4 lg:gap-x-6 py-2 md:py-3">
          <Link
            to={paths.start}
            className="font-serif text-xl font-semibold text-ink no-underline md:text-2xl"
          >
            Printwarden
          </Link>
          <nav aria-label="Main" className="flex flex-1 justify-end md:justify-start">
            <CompactMenu
              groups={groups}
              current={here}
              account={(onPick) => <AccountLinks session={session} onPick={onPick} />}
            />
            <div className="hidden gap-1 md:flex">
              {groups.map((group) => (
                <GroupMenu key={group.heading} group={group} current={here} />
              ))}
            </div>
          </nav>
          <div className="hidden md:block">
            <AccountLinks session={session} />
          </div>
        </div>
      </header>
      {leaving && (
        <p
          role="status"
          className="fixed top-2 left-1/2 z-50 -translate-x-1/2 rounded border border-paper-edge bg-paper px-3 py-1 text-sm shadow print:hidden"
        >
          Opening the page…
        </p>
      )}
      <main
        ref={main}
        id="main"
        // Focusable from script and the skip link only: following the link puts focus here.
        tabIndex={-1}
        aria-busy={leaving || undefined}
        className="mx-auto max-w-7xl px-4 py-4 outline-none md:py-6"
      >
        {/* Not `inert`: that would drop the focus, and Back puts focus on the opened result. */}
        <div
          className={leaving ? 'pointer-events-none opacity-60 transition-opacity' : undefined}
          onKeyDownCapture={(event) => {
            if (!leaving) return;
            event.preventDefault();
            event.stopPropagation();
          }}
        >
          <Suspense fallback={<Loading />}>{children}</Suspense>
        </div>
      </main>
    </div>
  );
}
