import clsx from 'clsx';
import { cautionsFor, GENERAL_PRECAUTIONS } from '@shared/domain/chemical-cautions';
import { ApiError } from '@/lib/api-client';

/** What went wrong, in words; field errors are shown beside their fields instead. */
export function ErrorNotice({ error, className }: { error: unknown; className?: string }) {
  if (!error) return null;
  const message =
    error instanceof ApiError
      ? `${error.title}${error.detail && error.detail !== error.title ? `: ${error.detail}` : ''}`
      : 'Something went wrong. Check the connection and try again.';
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
