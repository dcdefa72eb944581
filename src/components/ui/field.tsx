import clsx from 'clsx';
import {
  forwardRef,
  useId,
  type InputHTMLAttributes,
  type ReactNode,
  type SelectHTMLAttributes,
  type TextareaHTMLAttributes,
} from 'react';

interface FieldShell {
  label: string;
  error?: string;
  hint?: ReactNode;
  className?: string;
}

const control =
  'w-full rounded border border-paper-edge bg-white px-2 py-1.5 text-sm text-ink aria-[invalid=true]:border-alert';

/** Label, control, hint and inline error, wired together for screen readers. */
function Shell({
  label,
  error,
  hint,
  className,
  id,
  children,
}: FieldShell & { id: string; children: ReactNode }) {
  return (
    <div className={clsx('flex flex-col gap-1', className)}>
      <label htmlFor={id} className="text-xs font-semibold tracking-wide text-ink-soft uppercase">
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="text-xs text-ink-faint">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-xs font-medium text-alert">
          {error}
        </p>
      )}
    </div>
  );
}

function describedBy(id: string, error?: string, hint?: ReactNode): string | undefined {
  if (error) return `${id}-error`;
  return hint ? `${id}-hint` : undefined;
}

export const TextField = forwardRef<
  HTMLInputElement,
  FieldShell & InputHTMLAttributes<HTMLInputElement>
>(function TextField({ label, error, hint, className, ...props }, ref) {
  const id = useId();
  return (
    <Shell id={id} label={label} error={error} hint={hint} className={className}>
      <input
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className={control}
        {...props}
      />
    </Shell>
  );
});

export const TextArea = forwardRef<
  HTMLTextAreaElement,
  FieldShell & TextareaHTMLAttributes<HTMLTextAreaElement>
>(function TextArea({ label, error, hint, className, ...props }, ref) {
  const id = useId();
  return (
    <Shell id={id} label={label} error={error} hint={hint} className={className}>
      <textarea
        ref={ref}
        id={id}
        rows={4}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className={control}
        {...props}
      />
    </Shell>
  );
});

export const SelectField = forwardRef<
  HTMLSelectElement,
  FieldShell &
    SelectHTMLAttributes<HTMLSelectElement> & {
      options: ReadonlyArray<{ value: string | number; label: string }>;
      placeholder?: string;
    }
>(function SelectField({ label, error, hint, className, options, placeholder, ...props }, ref) {
  const id = useId();
  return (
    <Shell id={id} label={label} error={error} hint={hint} className={className}>
      <select
        ref={ref}
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, error, hint)}
        className={control}
        {...props}
      >
        {placeholder !== undefined && <option value="">{placeholder}</option>}
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </Shell>
  );
});
