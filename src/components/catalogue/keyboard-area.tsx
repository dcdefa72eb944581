import { useId, useState, type KeyboardEvent, type ReactNode } from 'react';
import {
  describeArea,
  nudgeArea,
  STARTING_AREA,
  type Area,
  type ArrowKey,
} from '@shared/domain/image-area';

const ARROWS: readonly string[] = ['ArrowLeft', 'ArrowRight', 'ArrowUp', 'ArrowDown'];

/**
 * Marking an area without a pointer: focus the photograph, arrow keys move the area (a new
 * one starts in the middle), Shift with arrow keys resizes it, Enter keeps it, Escape undoes.
 * Each change is announced through a polite live region. The area being moved is a draft
 * (shown dashed) until Enter keeps it.
 */
export function KeyboardArea({
  area,
  label,
  onKeep,
  children,
}: {
  area: Area | null;
  label: string;
  onKeep: (area: Area) => void;
  /** Draws the photograph with the area to show (the draft while one is being moved). */
  children: (shown: Area | null, draft: boolean) => ReactNode;
}) {
  const [draft, setDraft] = useState<Area | null>(null);
  const [message, setMessage] = useState('');
  const hint = useId();
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (ARROWS.includes(event.key)) {
      event.preventDefault();
      const next = nudgeArea(draft ?? area ?? STARTING_AREA, event.key as ArrowKey, event.shiftKey);
      setDraft(next);
      setMessage(`${event.shiftKey ? 'Resized' : 'Moved'}: ${describeArea(next)}. Enter keeps it.`);
    } else if (event.key === 'Enter' && draft) {
      event.preventDefault();
      onKeep(draft);
      setDraft(null);
      setMessage(`Area kept: ${describeArea(draft)}.`);
    } else if (event.key === 'Escape' && draft) {
      event.preventDefault();
      setDraft(null);
      setMessage('Change undone.');
    }
  };
  return (
    <div>
      <div
        role="application"
        tabIndex={0}
        aria-label={`Mark an area on ${label}`}
        aria-describedby={hint}
        onKeyDown={onKeyDown}
        className="inline-block rounded focus-visible:outline-2 focus-visible:outline-gall"
      >
        {children(draft ?? area, draft !== null)}
      </div>
      <p id={hint} className="text-xs text-ink-faint">
        Without a mouse: arrow keys move the area, Shift and arrow keys resize it, Enter keeps it.
      </p>
      <p aria-live="polite" className="sr-only">
        {message}
      </p>
    </div>
  );
}
