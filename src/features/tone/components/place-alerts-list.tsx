import { formatDate } from '@shared/domain/format';
import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { placeAlertQueries, useAcknowledgePlaceAlert } from '@/lib/place-alerts-api';

/**
 * Places whose temperature or humidity stayed outside their band, not yet acknowledged:
 * beside the prints' own alerts, since a bad room ages everything it holds.
 */
export function PlaceAlertsList() {
  const alerts = useQuery(placeAlertQueries.list());
  const acknowledge = useAcknowledgePlaceAlert();
  const open = alerts.data?.filter((a) => !a.acknowledgedAt) ?? [];
  return (
    <section id="place-alerts" aria-labelledby="place-alerts-heading" className="mt-8">
      <h2 id="place-alerts-heading" className="mb-2 text-xl">
        Places outside their band{' '}
        {alerts.data && <span className="text-base text-ink-faint">({open.length} open)</span>}
      </h2>
      <ErrorNotice error={alerts.error} />
      {alerts.isPending ? (
        <Loading label="Loading the places’ alerts…" />
      ) : open.length === 0 ? (
        !alerts.isError && <p className="text-sm text-ink-soft">Every place is within its band.</p>
      ) : (
        <ul className="divide-y divide-paper-edge text-sm">
          {open.map((alert) => (
            <li key={alert.id} className="flex flex-wrap items-baseline gap-x-3 gap-y-1 py-2">
              <Link to={paths.place(alert.place.id)}>
                {alert.place.name} <span className="font-mono text-xs">{alert.place.code}</span>
              </Link>
              <span className="text-xs text-ink-faint">
                {formatDate(alert.startedAt.slice(0, 10))} –{' '}
                {formatDate(alert.endedAt.slice(0, 10))}
              </span>
              {/* On a phone the reason takes its own full line, never a narrow column. */}
              <span className="basis-full sm:basis-auto sm:flex-1">{alert.reason}</span>
              <Button
                className="px-2 py-0.5 text-xs"
                onClick={() => acknowledge.mutate(alert.id)}
                disabled={acknowledge.isPending}
                aria-label={`Acknowledge alert for ${alert.place.name}: ${alert.reason}`}
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
