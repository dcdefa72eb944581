import clsx from 'clsx';
import type { ToneStatus } from '@shared/domain/vocabulary';

const toneStyles: Record<ToneStatus, string> = {
  unchecked: 'border-paper-edge text-ink-faint',
  steady: 'border-ok text-ok',
  watch: 'border-gall text-gall',
  fading: 'border-alert text-alert',
  darkening: 'border-alert text-alert',
  yellowing: 'border-alert text-alert',
};

const toneWords: Record<ToneStatus, string> = {
  unchecked: 'not yet checked',
  steady: 'steady',
  watch: 'watch',
  fading: 'fading',
  darkening: 'darkening',
  yellowing: 'yellowing',
};

export function ToneBadge({ status }: { status: ToneStatus }) {
  return (
    <span
      className={clsx(
        'inline-block rounded-full border px-2 py-0.5 text-xs whitespace-nowrap',
        toneStyles[status],
      )}
    >
      {toneWords[status]}
    </span>
  );
}

export function RiskMark({ risky }: { risky: boolean }) {
  if (!risky) return <span className="sr-only">no processing concerns</span>;
  return (
    <span
      className="inline-block rounded bg-alert-light px-1.5 py-0.5 text-xs font-medium whitespace-nowrap text-alert"
      title="Processing breaks a rule of thumb"
    >
      processing concern
    </span>
  );
}
