import clsx from 'clsx';
import { useEffect, useRef, useState, type KeyboardEvent } from 'react';
import type { ChecklistItem } from '@shared/types/catalogue';

/** `list` with the item at `from` moved to `to`. */
export function moved<T>(list: readonly T[], from: number, to: number): T[] {
  const next = [...list];
  const [item] = next.splice(from, 1);
  next.splice(Math.max(0, Math.min(next.length, to)), 0, item!);
  return next;
}

/**
 * The checklist's prints in order. Drag a row to move it, or focus its handle and press
 * Alt+↑ / Alt+↓ (or the arrow buttons); the move is announced for screen readers.
 */
export function ReorderList({
  items,
  onReorder,
  onRemove,
}: {
  items: ChecklistItem[];
  onReorder: (ids: number[]) => void;
  onRemove: (id: number) => void;
}) {
  const [dragging, setDragging] = useState<number | null>(null);
  const [announcement, setAnnouncement] = useState('');
  const [removed, setRemoved] = useState<{ item: ChecklistItem; order: number[] } | null>(null);
  // Handles by print id: after a move the same print's handle takes focus, wherever it is now.
  const handles = useRef(new Map<number, HTMLButtonElement>());
  const follow = useRef<number | null>(null);
  useEffect(() => {
    const id = follow.current;
    if (id === null) return;
    const handle = handles.current.get(id);
    const index = items.findIndex((item) => item.id === id);
    // Wait for the new order: until the list is redrawn the print still sits where it was.
    if (handle && index >= 0 && handle.dataset.position === String(index)) {
      follow.current = null;
      handle.focus();
    }
  });
  const move = (from: number, to: number) => {
    if (to < 0 || to >= items.length || from === to) return;
    follow.current = items[from]!.id;
    onReorder(moved(items, from, to).map((item) => item.id));
    setAnnouncement(
      `${items[from]!.accessionNumber} moved to position ${to + 1} of ${items.length}.`,
    );
  };
  const remove = (item: ChecklistItem) => {
    setRemoved({ item, order: items.map((other) => other.id) });
    setAnnouncement(`${item.accessionNumber} removed from the checklist.`);
    onRemove(item.id);
  };
  const onKeyDown = (index: number) => (event: KeyboardEvent) => {
    if (event.altKey && event.key === 'ArrowUp') {
      event.preventDefault();
      move(index, index - 1);
    } else if (event.altKey && event.key === 'ArrowDown') {
      event.preventDefault();
      move(index, index + 1);
    }
  };
  return (
    <>
      <p className="sr-only" aria-live="assertive">
        {announcement}
      </p>
      {removed && (
        <div
          role="status"
          className="mb-2 flex flex-wrap items-center gap-3 rounded border border-paper-edge bg-paper-deep/60 px-3 py-2 text-sm"
        >
          <span>
            Removed {removed.item.accessionNumber} {removed.item.title} from the checklist.
          </span>
          <button
            type="button"
            onClick={() => {
              onReorder(removed.order);
              setAnnouncement(`${removed.item.accessionNumber} is back in the checklist.`);
              setRemoved(null);
            }}
            className="rounded border border-paper-edge px-2 py-0.5 hover:bg-paper"
          >
            Undo
          </button>
        </div>
      )}
      <ol className="divide-y divide-paper-edge rounded border border-paper-edge bg-white/60">
        {items.map((item, index) => (
          <li
            key={item.id}
            draggable
            onDragStart={() => setDragging(index)}
            onDragOver={(event) => event.preventDefault()}
            onDrop={() => {
              if (dragging !== null) move(dragging, index);
              setDragging(null);
            }}
            className={clsx(
              'flex items-center gap-3 px-3 py-2',
              dragging === index && 'opacity-50',
            )}
          >
            <button
              type="button"
              ref={(element) => {
                if (element) handles.current.set(item.id, element);
                else handles.current.delete(item.id);
              }}
              data-position={index}
              onKeyDown={onKeyDown(index)}
              aria-label={`Move ${item.accessionNumber} ${item.title}, position ${index + 1} of ${items.length}. Alt and arrow keys move it.`}
              className="cursor-grab rounded border border-paper-edge px-1.5 text-ink-faint hover:bg-paper-deep"
            >
              ⠿
            </button>
            <span className="w-8 text-right tabular-nums text-ink-faint">{index + 1}</span>
            <span className="font-mono text-xs">{item.accessionNumber}</span>
            <span className="flex-1 font-serif text-base">{item.title}</span>
            <span className="hidden text-sm text-ink-soft md:inline">{item.maker ?? ''}</span>
            <span className="flex gap-1">
              <button
                type="button"
                aria-label={`Move ${item.accessionNumber} up`}
                disabled={index === 0}
                onClick={() => move(index, index - 1)}
                className="rounded px-1.5 hover:bg-paper-deep disabled:opacity-30"
              >
                ↑
              </button>
              <button
                type="button"
                aria-label={`Move ${item.accessionNumber} down`}
                disabled={index === items.length - 1}
                onClick={() => move(index, index + 1)}
                className="rounded px-1.5 hover:bg-paper-deep disabled:opacity-30"
              >
                ↓
              </button>
              <button
                type="button"
                aria-label={`Remove ${item.accessionNumber} from the checklist`}
                onClick={() => remove(item)}
                className="rounded px-1.5 text-ink-faint hover:bg-alert-light hover:text-alert"
              >
                ×
              </button>
            </span>
          </li>
        ))}
      </ol>
    </>
  );
}
