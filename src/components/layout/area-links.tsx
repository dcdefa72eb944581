import clsx from 'clsx';
import { Link } from 'react-router-dom';
import type { Area } from './areas';

/** One group's areas as a list of links; the current one is marked for eyes and screen readers. */
export function AreaLinks({
  areas,
  current,
  onPick,
  className,
}: {
  areas: Area[];
  current: Area | null;
  onPick: () => void;
  className?: string;
}) {
  return (
    <ul className={className}>
      {areas.map((area) => (
        <li key={area.to}>
          <Link
            to={area.to}
            onClick={onPick}
            aria-current={area === current ? 'page' : undefined}
            className={clsx(
              'block rounded px-3 py-2 text-sm no-underline',
              area === current ? 'bg-gall text-paper' : 'text-ink hover:bg-paper-edge/60',
            )}
          >
            {area.label}
          </Link>
        </li>
      ))}
    </ul>
  );
}
