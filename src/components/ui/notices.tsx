import clsx from 'clsx';
import type { ReactNode } from 'react';
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

/** The usual cautions wherever chemistry is shown (design §8). */
export function ChemicalCaution({ children }: { children?: ReactNode }) {
  return (
    <aside
      aria-label="Chemical safety"
      className="rounded border border-gall/40 bg-gall-light px-3 py-2 text-xs leading-relaxed text-ink-soft"
    >
      <strong className="text-gall-dark">Handle with care.</strong> Silver nitrate is corrosive,
      stains skin and can seriously damage eyes; thiosulfate fixers and gold or other toners carry
      their own hazards; used fixer holds silver. Wear gloves and eye protection, work with
      ventilation, keep solutions in labelled amber bottles, and dispose of silver-bearing waste
      under local rules. The chemical’s safety data sheet, local regulations and licensed practice
      come first. {children}
    </aside>
  );
}
