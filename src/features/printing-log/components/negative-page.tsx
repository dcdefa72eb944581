import { useQuery } from '@tanstack/react-query';
import { Link, useParams } from 'react-router-dom';
import type { PrintingLogView } from '@shared/types/chemistry';
import { ToneBadge } from '@/components/ui/badges';
import { ButtonLink } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { printingLogQueries } from '../api/printing-log';
import { NextPrintPlanner } from './next-print-planner';

/** A negative and its printing log: every print made from it, and where to start next. */
export function NegativePage() {
  const id = Number(useParams().id);
  const log = useQuery(printingLogQueries.detail(id));
  if (log.isPending) return <Loading label="Loading the negative…" />;
  if (log.error) return <ErrorNotice error={log.error} />;
  const { negative } = log.data;
  return (
    <article>
      <PageHeader
        eyebrow="Negative"
        title={
          <>
            <span className="font-mono">{negative.code}</span>
            {negative.subject && <span> · {negative.subject}</span>}
          </>
        }
        actions={<ButtonLink to={paths.negatives}>All negatives</ButtonLink>}
      />
      <p className="mb-6 text-sm text-ink-soft">
        {[
          negative.kind,
          negative.format,
          negative.densityRange != null
            ? `density range ${negative.densityRange.toFixed(2)}`
            : null,
        ]
          .filter(Boolean)
          .join(' · ')}
      </p>
      <div className="grid gap-8 lg:grid-cols-[minmax(0,1.6fr)_minmax(0,1fr)]">
        <section aria-labelledby="printing-log">
          <h2 id="printing-log" className="mb-2 text-xl">
            Printing log ({log.data.prints.length})
          </h2>
          <PrintingLogTable log={log.data} />
        </section>
        <NextPrintPlanner log={log.data} />
      </div>
    </article>
  );
}

function PrintingLogTable({ log }: { log: PrintingLogView }) {
  if (log.prints.length === 0) {
    return <p className="text-sm text-ink-faint">No print from this negative is catalogued yet.</p>;
  }
  return (
    <div className="relative overflow-x-auto rounded border border-paper-edge bg-white/60">
      <table className="w-full border-collapse text-sm">
        <thead className="bg-paper-deep text-left text-xs tracking-wide text-ink-soft uppercase">
          <tr>
            {['Made', 'Print', 'Paper', 'Light', 'Exposure', 'Outcome'].map((label) => (
              <th key={label} scope="col" className="px-3 py-2">
                {label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {log.prints.map((print) => (
            <tr key={print.id} className="border-t border-paper-edge/70">
              <td className="px-3 py-1.5 whitespace-nowrap">{print.madeOn ?? '—'}</td>
              <td className="px-3 py-1.5">
                <Link to={paths.print(print.id)}>{print.title}</Link>
                <span className="block font-mono text-xs text-ink-faint">
                  {print.accessionNumber}
                </span>
              </td>
              <td className="px-3 py-1.5">{print.paper?.name ?? '—'}</td>
              <td className="px-3 py-1.5">{print.lightSource ?? '—'}</td>
              <td className="px-3 py-1.5 whitespace-nowrap">
                {print.exposureMinutes != null ? `${print.exposureMinutes} min` : '—'}
              </td>
              <td className="px-3 py-1.5">
                <ToneBadge status={print.toneStatus} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
