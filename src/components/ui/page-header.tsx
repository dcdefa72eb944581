import type { ReactNode } from 'react';

export function PageHeader({
  title,
  eyebrow,
  actions,
}: {
  title: ReactNode;
  eyebrow?: ReactNode;
  actions?: ReactNode;
}) {
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
