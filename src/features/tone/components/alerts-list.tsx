import { formatDate } from '@shared/domain/format';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import { useAcknowledgeAlert } from '../api/tone-mutations';
import { toneQueries } from '../api/tone-queries';

/** Open alerts first; each can be acknowledged. A failed load says so and offers a retry. */
export function AlertsList() {
  const alerts = useQuery(toneQueries.alerts());
  const acknowledge = useAcknowledgeAlert();
  const open = alerts.data?.items.filter((a) => !a.acknowledgedAt) ?? [];
  return (
    <section aria-labelledby="alerts-heading" className="mt-8">
      <h2 id="alerts-heading" className="mb-2 text-xl">
        Alerts{' '}
        {alerts.data && <span className="text-base text-ink-faint">({open.length} open)</span>}
      </h2>
      {alerts.isError ? (
        <div className="flex flex-wrap items-center gap-2">
          <p
            role="alert"
            className="flex-1 rounded border border-alert bg-alert-light px-3 py-2 text-sm text-alert"
          >
            The alerts could not be loaded
            {alerts.error instanceof ApiError ? ` (${alerts.error.title})` : ''}.
          </p>
          <Button onClick={() => void alerts.refetch()} disabled={alerts.isFetching}>
            {alerts.isFetching ? 'Trying again…' : 'Try again'}
          </Button>
        </div>
      ) : alerts.isPending ? (
        <Loading label="Loading alerts…" />
      ) : open.length === 0 ? (
        <p className="text-sm text-ink-soft">No open alerts.</p>
      ) : (
        <ul className="divide-y divide-paper-edge text-sm">
          {open.slice(0, 50).map((alert) => (
            <li key={alert.id} className="flex flex-wrap items-center gap-2 py-1.5">
              <Link to={paths.print(alert.print.id)} className="font-mono">
                {alert.print.accessionNumber}
              </Link>
              {/* Under 640 px the message takes a full line below the number, date and button. */}
              <span className="order-last basis-full sm:order-none sm:flex-1">{alert.reason}</span>
              <span className="text-xs text-ink-faint">{formatDate(alert.openedAt)}</span>
              <Button
                className="px-2 py-0.5 text-xs"
                onClick={() => acknowledge.mutate(alert.id)}
                aria-label={`Acknowledge alert for ${alert.print.accessionNumber}: ${alert.reason}`}
              >
                Acknowledge
              </Button>
            </li>
          ))}
        </ul>
      )}
      <ErrorNotice error={acknowledge.error} />
    </section>
  );
}
