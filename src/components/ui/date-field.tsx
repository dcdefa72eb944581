import { UNREADABLE_DATE_MESSAGE } from '@shared/domain/calendar';
import {
  forwardRef,
  useEffect,
  useRef,
  useState,
  type InputHTMLAttributes,
  type ReactNode,
  type RefObject,
} from 'react';
import { TextField } from './field';

/**
 * When to look again: typing into the day, month or year fires no `input` while the date
 * stays unreadable (the value stays empty), so keys and leaving the field count too.
 */
const DATE_EVENTS = ['input', 'change', 'blur', 'focusout', 'keyup'] as const;

/**
 * The browser's date field keeps no value when the date typed does not exist (31 April) or is
 * half typed: the form would see an empty field and say nothing, or "required". This names the
 * problem instead, and stops the form from being sent (its own submit handler never runs, and
 * the browser's own bubble is not shown) until the date is a real one or cleared.
 */
export function useUnreadableDate(input: RefObject<HTMLInputElement | null>): string | undefined {
  const [unreadable, setUnreadable] = useState(false);
  useEffect(() => {
    const field = input.current;
    if (!field) return;
    const check = () => setUnreadable(field.validity.badInput);
    const refuse = (event: Event) => {
      if (!field.validity.badInput) return;
      event.preventDefault();
      event.stopImmediatePropagation();
      setUnreadable(true);
      field.focus();
    };
    const form = field.form;
    for (const type of DATE_EVENTS) field.addEventListener(type, check);
    field.addEventListener('invalid', refuse);
    // Capturing on the form runs before React's handler, which listens at the app's root.
    form?.addEventListener('submit', refuse, true);
    return () => {
      for (const type of DATE_EVENTS) field.removeEventListener(type, check);
      field.removeEventListener('invalid', refuse);
      form?.removeEventListener('submit', refuse, true);
    };
  }, [input]);
  return unreadable ? UNREADABLE_DATE_MESSAGE : undefined;
}

/** A labelled date field (see `TextField`) that says so when the date typed does not exist. */
export const DateField = forwardRef<
  HTMLInputElement,
  { label: string; error?: string; hint?: ReactNode; className?: string } & Omit<
    InputHTMLAttributes<HTMLInputElement>,
    'type'
  >
>(function DateField({ error, ...props }, ref) {
  const own = useRef<HTMLInputElement | null>(null);
  const unreadable = useUnreadableDate(own);
  return (
    <TextField
      {...props}
      type="date"
      error={unreadable ?? error}
      ref={(element) => {
        own.current = element;
        if (typeof ref === 'function') ref(element);
        else if (ref) ref.current = element;
      }}
    />
  );
});
