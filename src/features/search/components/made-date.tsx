import { useId, useRef } from 'react';
import { useUnreadableDate } from '@/components/ui/date-field';

/** One end of the Made filter: a compact date field that says when the date does not exist. */
export function MadeDate({
  label,
  value,
  onChange,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
}) {
  const input = useRef<HTMLInputElement>(null);
  const unreadable = useUnreadableDate(input);
  const errorId = useId();
  return (
    <>
      <label className="flex items-center justify-between gap-2">
        {label}
        <input
          ref={input}
          type="date"
          value={value}
          onChange={(event) => onChange(event.target.value)}
          aria-invalid={unreadable ? true : undefined}
          aria-describedby={unreadable ? errorId : undefined}
          className="rounded border border-paper-edge bg-white px-1.5 py-1 aria-[invalid=true]:border-alert"
        />
      </label>
      {unreadable && (
        <p id={errorId} className="text-xs font-medium text-alert">
          {unreadable}
        </p>
      )}
    </>
  );
}
