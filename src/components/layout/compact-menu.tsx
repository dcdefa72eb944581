import type { ReactNode } from 'react';
import type { Area, AreaGroup } from './areas';
import { AreaLinks } from './area-links';
import { useHeaderMenu } from './use-header-menu';

/**
 * The narrow header's one button: it names the current area and opens every heading with
 * its areas, and the account links, in a panel below the header.
 */
export function CompactMenu({
  groups,
  current,
  account,
}: {
  groups: AreaGroup[];
  current: Area | null;
  account: (onPick: () => void) => ReactNode;
}) {
  const { open, close, root, buttonProps, panelProps } = useHeaderMenu();
  return (
    <div ref={root} className="md:hidden">
      <button
        {...buttonProps}
        className="flex min-h-11 items-center gap-2 rounded border border-paper-edge px-3 text-sm"
      >
        <span aria-hidden="true">{open ? '✕' : '☰'}</span>
        <span>Menu</span>
        {current && (
          <span className="max-w-36 truncate font-semibold">
            <span className="sr-only">, now in </span>
            <span aria-hidden="true"> · </span>
            {current.label}
          </span>
        )}
      </button>
      <div
        {...panelProps}
        className="absolute inset-x-0 top-full z-30 max-h-[80vh] overflow-y-auto border-b border-paper-edge bg-paper px-4 pb-4 shadow-md"
      >
        {groups.map((group) => (
          <section key={group.heading} aria-label={group.heading} className="mt-3">
            <h2 className="px-3 text-xs font-semibold tracking-widest text-ink-faint uppercase">
              {group.heading}
            </h2>
            <AreaLinks
              areas={group.areas}
              current={current}
              onPick={close}
              className="grid grid-cols-2 gap-x-2"
            />
          </section>
        ))}
        <div className="mt-4 border-t border-paper-edge pt-3">{account(close)}</div>
      </div>
    </div>
  );
}
