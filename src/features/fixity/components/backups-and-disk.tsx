import { useQuery } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';
import { useLocation } from 'react-router-dom';
import { overviewQueries } from '@/lib/overview-queries';

/**
 * Where the start page's backup and disk items lead: their figures again, and how backups
 * are made and used, which happens on the server, not in the browser.
 */
export function BackupsAndDisk() {
  const overview = useQuery(overviewQueries.mine());
  const items = (overview.data?.items ?? []).filter(
    (item) => item.kind === 'backup-age' || item.kind === 'uploads-disk',
  );
  const section = useRef<HTMLElement>(null);
  const { hash } = useLocation();
  // A link from the start page names this part: the router does not scroll to it.
  useEffect(() => {
    if (hash === '#backups') section.current?.scrollIntoView({ block: 'start' });
  }, [hash]);
  return (
    <section
      id="backups"
      ref={section}
      aria-labelledby="backups-heading"
      className="mt-8 border-t border-paper-edge pt-5"
    >
      <h2 id="backups-heading" className="mb-2 text-xl">
        Backups and disk
      </h2>
      <ul className="mb-3 list-disc pl-5 text-sm">
        {overview.isPending && <li>Counting…</li>}
        {items.map((item) => (
          <li key={item.kind}>
            {item.kind === 'backup-age' && item.count !== null
              ? `${item.label}: ${item.count}`
              : item.label}
          </li>
        ))}
      </ul>
      <p className="max-w-prose text-sm text-ink-soft">
        Backups are made on the server by whoever runs it, not from this page:{' '}
        <code>npm run backup -- FILE</code> writes a consistent copy of the database while
        Printwarden runs, and the stored originals are copied beside it (they never change once
        written). To restore, the server is stopped, <code>npm run restore -- FILE</code> is run,
        the originals are put back and the server is started again. The README says more.
      </p>
    </section>
  );
}
