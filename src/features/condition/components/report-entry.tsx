import { formatDate } from '@shared/domain/format';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { AttachedImageView, ConditionReportView } from '@shared/types/condition';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { ErrorNotice } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { useDeleteConditionReport } from '../api/condition-queries';
import { GradeMark } from './grade-mark';

/** A saved condition report: its line on the timeline opens to everything it says. */
export function ReportEntry({ report }: { report: ConditionReportView }) {
  const can = useCan();
  const remove = useDeleteConditionReport();
  const [asking, setAsking] = useState(false);
  const { environment } = report;
  return (
    <article
      aria-label={`Condition report of ${formatDate(report.reportedOn)}`}
      className="text-sm"
    >
      <details>
        <summary className="flex cursor-pointer flex-wrap items-baseline gap-2">
          <time dateTime={report.reportedOn} className="font-mono text-xs text-ink-faint">
            {formatDate(report.reportedOn, true)}
          </time>
          <span className="font-medium">Condition report</span>
          {report.grade && <GradeMark grade={report.grade} />}
          {report.reportedBy && <span className="text-ink-faint">by {report.reportedBy.name}</span>}
        </summary>
        <div className="mt-1 space-y-1">
          {report.observations.length > 0 ? (
            <ul className="list-disc pl-5">
              {report.observations.map((observation, index) => (
                <li key={index}>
                  {observation.term}, {observation.severity} — {observation.location}
                </li>
              ))}
            </ul>
          ) : (
            <p className="text-ink-faint">Nothing observed.</p>
          )}
          {environment && (
            <p>
              <span className="text-ink-faint">Room: </span>
              {[
                environment.temperatureC != null ? `${environment.temperatureC} °C` : null,
                environment.rh != null ? `${environment.rh} % RH` : null,
              ]
                .filter(Boolean)
                .join(', ')}
            </p>
          )}
          {report.notes && (
            <p className="whitespace-pre-line">
              <span className="text-ink-faint">Notes: </span>
              {report.notes}
            </p>
          )}
          {report.recommendation && (
            <p>
              <span className="text-ink-faint">Recommendation: </span>
              {report.recommendation}
            </p>
          )}
          {report.images.length > 0 && (
            <ul aria-label="Photographs" className="flex flex-wrap gap-3">
              {report.images.map((image) => (
                <MarkedImage key={image.assetId} image={image} />
              ))}
            </ul>
          )}
          {can('condition:write') && (
            <p className="flex gap-2 pt-1">
              <Link
                className="rounded border border-paper-edge px-2 py-0.5 text-xs"
                to={paths.editConditionReport(report.printId, report.id)}
              >
                Correct
              </Link>
              <Button
                tone="danger"
                className="px-2 py-0.5 text-xs"
                disabled={remove.isPending}
                onClick={() => setAsking(true)}
              >
                Delete
              </Button>
            </p>
          )}
          <ConfirmDialog
            open={asking}
            title={`Delete the condition report of ${formatDate(report.reportedOn)}?`}
            confirmLabel="Delete"
            danger
            onCancel={() => setAsking(false)}
            onConfirm={() => {
              setAsking(false);
              remove.mutate(report.id);
            }}
          />
          <ErrorNotice error={remove.error} />
        </div>
      </details>
    </article>
  );
}

/** A photograph with its marked area drawn over it, and its caption. */
function MarkedImage({ image }: { image: AttachedImageView }) {
  const caption = image.caption ?? 'Attached photograph';
  return (
    <li className="w-40">
      <figure>
        <div className="relative">
          {image.urls ? (
            <img src={image.urls.thumbnail} alt={caption} className="block w-full" />
          ) : (
            <div className="h-24 bg-paper-deep" role="img" aria-label={caption} />
          )}
          {image.area && (
            <span
              aria-hidden="true"
              className="absolute border-2 border-alert"
              style={{
                left: `${image.area.x * 100}%`,
                top: `${image.area.y * 100}%`,
                width: `${image.area.width * 100}%`,
                height: `${image.area.height * 100}%`,
              }}
            />
          )}
        </div>
        <figcaption className="mt-0.5 text-xs">
          {caption}
          {image.area && <span className="text-ink-faint"> (marked area)</span>}
        </figcaption>
      </figure>
    </li>
  );
}
