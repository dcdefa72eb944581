import clsx from 'clsx';
import { cautionsFor, GENERAL_PRECAUTIONS } from '@shared/domain/chemical-cautions';
import { ApiError } from '@/lib/api-client';

const CONNECTION_MESSAGE = 'Something went wrong. Check the connection and try again.';

/** Plain words for an answer that carries no sentence of its own. */
const STATUS_WORDS: Record<number, string> = {
  401: 'You are signed out. Sign in again to go on.',
  403: 'Your role may not do this.',
  404: 'This record no longer exists.',
  409: 'This change conflicts with the records as they are now.',
  413: 'The file is too large.',
  422: 'Some values need correcting.',
  429: 'Too many attempts. Wait a few minutes and try again.',
};

/**
 * The sentence to show for a problem: its detail, in our words, never prefixed with the
 * HTTP status name ("Conflict: …").
 */
export function problemMessage(error: ApiError): string {
  // Invalid input with no field beside it to show on (a query): its own messages, in full.
  if (error.status === 422 && error.errors.length) {
    return [...new Set(error.errors.map((item) => item.message))].join(' ');
  }
  if (error.detail) return error.detail;
  return STATUS_WORDS[error.status] ?? (error.status >= 500 ? CONNECTION_MESSAGE : error.title);
}

/** What went wrong, in words; field errors are shown beside their fields instead. */
export function ErrorNotice({ error, className }: { error: unknown; className?: string }) {
  if (!error) return null;
  const message = error instanceof ApiError ? problemMessage(error) : CONNECTION_MESSAGE;
  return (
    <div
      role="alert"
      className={clsx(
        'rounded border border-alert bg-alert-light px-3 py-2 text-sm text-alert',
        className,
      )}
    >
      {message}
    </div>
  );
}

export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="py-8 text-center text-sm text-ink-faint">
      {label}
    </p>
  );
}

/** The usual cautions wherever chemistry is shown (design §8), specific to the chemicals named. */
export function ChemicalCaution({ chemicals = [] }: { chemicals?: ReadonlyArray<string | null> }) {
  const specific = cautionsFor(chemicals);
  return (
    <aside
      aria-label="Chemical safety"
      className="rounded border border-gall/40 bg-gall-light px-3 py-2 text-xs leading-relaxed text-ink-soft"
    >
      <strong className="text-gall-dark">Handle with care.</strong> {GENERAL_PRECAUTIONS}
      {specific.length > 0 && (
        <ul className="mt-1 list-disc pl-4">
          {specific.map((item) => (
            <li key={item.chemical}>
              <strong>{item.chemical}</strong>: {item.caution}
            </li>
          ))}
        </ul>
      )}
      <p className="mt-1">
        The chemical’s safety data sheet, local regulations and licensed practice come first.
      </p>
    </aside>
  );
}
