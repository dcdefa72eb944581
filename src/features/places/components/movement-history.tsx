import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { movementQueries } from '@/lib/catalogue';
import { useCan } from '@/lib/session';

/** The print record's places over time, latest first (curators and above; never viewers). */
export function MovementHistory({ printId }: { printId: number }) {
  const can = useCan();
  const movements = useQuery({
    ...movementQueries.ofPrint(printId),
    enabled: can('locations:read'),
  });
  if (!can('locations:read')) return null;
  return (
    <section aria-labelledby="record-movements" className="mt-8 border-t border-paper-edge pt-5">
      <h2 id="record-movements" className="mb-2 text-xl">
        Where it has been
      </h2>
      {movements.error ? (
        <ErrorNotice error={movements.error} />
      ) : !movements.data ? (
        <Loading label="Loading the movements…" />
      ) : movements.data.length === 0 ? (
        <p className="text-sm text-ink-soft">No place recorded yet.</p>
      ) : (
        <table className="w-full text-sm">
          <thead>
            <tr className="text-left text-ink-soft">
              <th scope="col">On</th>
              <th scope="col">From</th>
              <th scope="col">To</th>
              <th scope="col">Why</th>
              <th scope="col">By</th>
            </tr>
          </thead>
          <tbody>
            {movements.data.map((movement) => (
              <tr key={movement.id} className="border-t border-paper-edge">
                <td className="tabular-nums">{movement.movedOn}</td>
                <td>{movement.from ? movement.from.code : '—'}</td>
                <td>
                  {movement.to ? (
                    <Link to={paths.place(movement.to.id)}>{movement.to.code}</Link>
                  ) : (
                    'no place'
                  )}
                </td>
                <td>{movement.reason}</td>
                <td>{movement.movedBy?.name ?? 'a removed user'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}
