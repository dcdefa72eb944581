import type { PrintView } from '@shared/types/catalogue';
import { ButtonLink } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { reportPdfUrl } from '../api/condition-queries';
import { ConditionTimeline } from './condition-timeline';

/** The record page's condition section: timeline, new report or treatment, the printable report. */
export function ConditionPanel({ print }: { print: PrintView }) {
  const can = useCan();
  if (!can('condition:read')) return null;
  return (
    <section aria-labelledby="record-condition" className="mt-8">
      <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
        <h2 id="record-condition" className="text-xl">
          Condition and treatments
        </h2>
        <div className="flex flex-wrap gap-2 print:hidden">
          {can('condition:write') && (
            <>
              <ButtonLink to={paths.newConditionReport(print.id)} tone="primary">
                Write condition report
              </ButtonLink>
              <ButtonLink to={paths.newTreatment(print.id)}>Record treatment</ButtonLink>
            </>
          )}
          <button
            type="button"
            onClick={() => window.print()}
            className="inline-flex items-center rounded border border-paper-edge px-3 py-1.5 text-sm font-medium text-ink hover:bg-paper-deep"
          >
            Print this page
          </button>
          <a
            href={reportPdfUrl(print.id)}
            download
            className="inline-flex items-center rounded border border-paper-edge px-3 py-1.5 text-sm font-medium text-ink no-underline hover:bg-paper-deep"
          >
            Report as PDF
          </a>
        </div>
      </div>
      <ConditionTimeline printId={print.id} />
    </section>
  );
}
