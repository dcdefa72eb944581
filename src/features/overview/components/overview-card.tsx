import clsx from 'clsx';
import { Link } from 'react-router-dom';
import type { OverviewItem } from '@shared/types/overview';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/notices';
import { useMarkSeen } from '../api/overview-mutations';

/** Kinds where any count above nought asks for someone's attention. */
const NEEDS_ATTENTION = new Set([
  'checks-overdue',
  'open-alerts',
  'place-alerts',
  'mail-undelivered',
  'fixity',
  'processing-concerns',
]);

/** One line of the start page: its count large, its words, the whole card a link. */
export function OverviewCard({ item }: { item: OverviewItem }) {
  const attention = NEEDS_ATTENTION.has(item.kind) && (item.count ?? 0) > 0;
  const shown = item.kind === 'uploads-disk' ? null : item.count;
  return (
    <li className="flex flex-col gap-1">
      <Link
        to={item.href}
        className={clsx(
          'flex min-h-20 flex-1 items-center gap-4 rounded border bg-white/60 px-4 py-3 text-ink no-underline hover:bg-white',
          attention ? 'border-alert' : 'border-paper-edge',
        )}
      >
        {shown !== null && (
          <span
            className={clsx(
              'min-w-12 font-serif text-4xl leading-none tabular-nums',
              attention ? 'text-alert' : 'text-gall',
            )}
          >
            {shown}
          </span>
        )}
        <span className="text-sm">{withWholeDates(item.label)}</span>
      </Link>
      {item.kind === 'status-changed' && (item.count ?? 0) > 0 && <MarkSeen />}
    </li>
  );
}

/** A date in a label (2026-12-11) stays on one line: broken at its hyphens it read as two. */
function withWholeDates(label: string) {
  return label.split(/(\d{4}-\d{2}-\d{2})/).map((part, index) =>
    index % 2 === 1 ? (
      <span key={index} className="whitespace-nowrap">
        {part}
      </span>
    ) : (
      part
    ),
  );
}

/**
 * "Since you last looked" moves only here: the person says they have seen the changes (a
 * second sign-in or another device no longer hides them).
 */
function MarkSeen() {
  const mark = useMarkSeen();
  return (
    <div className="flex flex-col items-start gap-1">
      <Button
        className="px-2 py-0.5 text-xs"
        disabled={mark.isPending}
        onClick={() => mark.mutate({ kind: 'status-changed' })}
      >
        {mark.isPending ? 'Marking…' : 'Mark these changes seen'}
      </Button>
      <ErrorNotice error={mark.error} />
    </div>
  );
}
