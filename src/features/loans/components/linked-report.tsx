import { useQuery } from '@tanstack/react-query';
import type { LoanPrintView } from '@shared/types/loan';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { paths } from '@/config/paths';
import { loanQueries } from '../api/loan-queries';

export type ReportMoment = 'departure' | 'return';

const WORDS: Record<ReportMoment, string> = {
  departure: 'Condition at departure',
  return: 'Condition on return',
};

/**
 * The condition report a print leaves with, or comes back with: shown to all, chosen from
 * the print's own condition reports by a conservator, who can also write a new one.
 */
export function LinkedReport({
  print,
  moment,
  canLink,
  link,
}: {
  print: LoanPrintView;
  moment: ReportMoment;
  canLink: boolean;
  link: (reportId: number | null) => void;
}) {
  const reports = useQuery({ ...loanQueries.reports(print.id), enabled: canLink });
  const [choice, setChoice] = useState('');
  const linkedId = moment === 'departure' ? print.departureReportId : print.returnReportId;
  if (!canLink) return <>{linkedId ? `report ${linkedId}` : '—'}</>;
  const items = reports.data?.items ?? [];
  const linked = items.find((report) => report.id === linkedId);
  const id = `${moment}-${print.id}`;
  return (
    <div className="flex flex-col gap-1">
      <span>
        {linked ? (
          <Link to={paths.editConditionReport(print.id, linked.id)}>
            {linked.reportedOn}, {linked.grade ?? 'not graded'}
          </Link>
        ) : (
          'no report linked'
        )}
      </span>
      {items.length > 0 && (
        <div className="flex flex-wrap gap-1">
          <label className="sr-only" htmlFor={id}>
            {WORDS[moment]} of {print.accessionNumber}
          </label>
          <select
            id={id}
            value={choice}
            onChange={(event) => setChoice(event.target.value)}
            className="rounded border border-paper-edge bg-white px-1 py-0.5 text-xs"
          >
            <option value="">Choose a report</option>
            {items.map((report) => (
              <option key={report.id} value={report.id}>
                {report.reportedOn} · {report.grade ?? 'not graded'}
              </option>
            ))}
          </select>
          <Button
            disabled={!choice}
            aria-label={`Link ${moment} report of ${print.accessionNumber}`}
            onClick={() => link(Number(choice))}
          >
            Link
          </Button>
        </div>
      )}
      <Link className="text-xs" to={paths.newConditionReport(print.id)}>
        Write a report
      </Link>
    </div>
  );
}
