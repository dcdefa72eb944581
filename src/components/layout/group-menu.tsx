import clsx from 'clsx';
import type { Area, AreaGroup } from './areas';
import { AreaLinks } from './area-links';
import { useHeaderMenu } from './use-header-menu';

/** A heading of the wide header: a button that shows its group's areas below it. */
export function GroupMenu({ group, current }: { group: AreaGroup; current: Area | null }) {
  const { open, close, root, buttonProps, panelProps } = useHeaderMenu();
  const holdsCurrent = current !== null && group.areas.includes(current);
  return (
    <div ref={root} className="relative">
      <button
        {...buttonProps}
        className={clsx(
          'flex items-center gap-1 rounded px-2 py-1.5 text-sm whitespace-nowrap lg:px-3',
          holdsCurrent ? 'bg-gall text-paper' : 'text-ink hover:bg-paper-edge/60',
        )}
      >
        {group.heading}
        {holdsCurrent && <span className="sr-only"> (you are here)</span>}
        <span aria-hidden="true" className="text-xs">
          {open ? '▴' : '▾'}
        </span>
      </button>
      <div
        {...panelProps}
        className="absolute top-full left-0 z-30 mt-1 min-w-48 rounded border border-paper-edge bg-paper p-1 shadow-md"
      >
        <AreaLinks areas={group.areas} current={current} onPick={close} />
      </div>
    </div>
  );
}
