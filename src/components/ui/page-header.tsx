import type { ReactNode } from 'react';

/** A page's title; `accession` puts a print's accession number above it, in the number's own type. */
export function PageHeader({
  title,
  eyebrow,
  accession,
  actions,
}: {
  title: ReactNode;
  eyebrow?: ReactNode;
  accession?: string;
  actions?: ReactNode;
}) {
  if (accession) {
    eyebrow = <span className="font-mono tracking-normal normal-case">{accession}</span>;
  }
  return (
    <header className="mb-5 flex flex-wrap items-end justify-between gap-3 border-b border-paper-edge pb-3">
      <div>
        {eyebrow && (
          <p className="text-xs font-semibold tracking-widest text-ink-faint uppercase">
            {eyebrow}
          </p>
        )}
        <h1 className="text-3xl font-medium">{title}</h1>
      </div>
      {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
    </header>
  );
}
