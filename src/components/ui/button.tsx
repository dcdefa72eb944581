import clsx from 'clsx';
import type { ButtonHTMLAttributes } from 'react';
import { Link, type LinkProps } from 'react-router-dom';

type Tone = 'primary' | 'quiet' | 'danger';

const tones: Record<Tone, string> = {
  primary: 'bg-gall text-paper hover:bg-gall-dark border-gall',
  quiet: 'bg-transparent text-ink hover:bg-paper-deep border-paper-edge',
  danger: 'bg-transparent text-alert hover:bg-alert-light border-alert',
};

const base =
  'inline-flex items-center gap-1.5 rounded border px-3 py-1.5 text-sm font-medium no-underline transition-colors disabled:cursor-not-allowed disabled:opacity-50';

export function Button({
  tone = 'quiet',
  className,
  type = 'button',
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { tone?: Tone }) {
  return <button type={type} className={clsx(base, tones[tone], className)} {...props} />;
}

export function ButtonLink({ tone = 'quiet', className, ...props }: LinkProps & { tone?: Tone }) {
  return <Link className={clsx(base, tones[tone], className)} {...props} />;
}
