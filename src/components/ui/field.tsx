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

/** A field that cannot be changed (disabled or read-only) loses its white box and reads grey. */
const control =
  'w-full rounded border border-paper-edge bg-white px-2 py-1.5 text-sm text-ink aria-[invalid=true]:border-alert ' +
  '[&[readonly]]:border-dashed [&[readonly]]:bg-transparent [&[readonly]]:text-ink-soft ' +
  'disabled:cursor-not-allowed disabled:border-dashed disabled:bg-transparent disabled:text-ink-soft';

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
      {/* No CSS upper-casing: a label may hold a colour symbol (a*, b*, ΔE*ab) whose case is its meaning. */}
      <label htmlFor={id} className="text-xs font-semibold tracking-wide text-ink-soft">
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

/** The control's id, invalid state and the message that describes it. */
function controlProps(id: string, error?: string, hint?: ReactNode) {
  const describedBy = error ? `${id}-error` : hint ? `${id}-hint` : undefined;
  return {
    id,
    'aria-invalid': error ? true : undefined,
    'aria-describedby': describedBy,
    className: control,
  };
}

export const TextField = forwardRef<
  HTMLInputElement,
  FieldShell & InputHTMLAttributes<HTMLInputElement>
>(function TextField({ label, error, hint, className, ...props }, ref) {
  const id = useId();
  return (
    <Shell id={id} label={label} error={error} hint={hint} className={className}>
      <input ref={ref} {...controlProps(id, error, hint)} {...props} />
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
      <textarea ref={ref} rows={4} {...controlProps(id, error, hint)} {...props} />
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
      <select ref={ref} {...controlProps(id, error, hint)} {...props}>
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
