import { useQuery } from '@tanstack/react-query';
import { formatNumber } from '@shared/domain/format';
import { DOSE_COUNTED_HOW, doseNotCountedNote } from '@shared/domain/light/dose-words';
import { LIGHT_CAUTION } from '@shared/domain/light/settings';
import type { PrintStatus } from '@shared/domain/vocabulary';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { loanQueries } from '../api/loan-queries';

/** The print record's light dose per year and over its life, beside the tone trend. */
export function LightPanel({ printId, status }: { printId: number; status: PrintStatus }) {
  const light = useQuery(loanQueries.light(printId));
  return (
    <section aria-labelledby="record-light" className="mt-8 border-t border-paper-edge pt-5">
      <h2 id="record-light" className="mb-2 text-xl">
        Light received
      </h2>
      {light.error ? (
        <ErrorNotice error={light.error} />
      ) : !light.data ? (
        <Loading label="Loading the light dose…" />
      ) : (
        <>
          <p className="mb-1 text-sm">
            Counted over its life: <strong>{formatNumber(light.data.lifetimeLuxHours)} lx·h</strong>
          </p>
          {doseNotCountedNote(status, light.data.lifetimeLuxHours) && (
            <p className="mb-1 text-sm">
              {doseNotCountedNote(status, light.data.lifetimeLuxHours)}
            </p>
          )}
          <p className="mb-2 max-w-prose text-xs text-ink-soft">{DOSE_COUNTED_HOW}</p>
          {light.data.years.length > 0 && (
            <table className="mb-2 w-full max-w-lg text-sm">
              <thead>
                <tr className="text-left text-ink-soft">
                  <th scope="col">Year</th>
                  <th scope="col">Received (lx·h)</th>
                  <th scope="col">Annual limit (lx·h)</th>
                </tr>
              </thead>
              <tbody>
                {light.data.years.map((year) => (
                  <tr key={year.year} className="border-t border-paper-edge">
                    <td className="tabular-nums">{year.year}</td>
                    <td className="tabular-nums">
                      {formatNumber(year.luxHours)}
                      {year.luxHours > year.limit && (
                        <span className="ml-2 font-semibold text-alert">over the limit</span>
                      )}
                    </td>
                    <td className="tabular-nums">{formatNumber(year.limit)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
          <p className="max-w-prose text-xs text-ink-soft">{LIGHT_CAUTION}</p>
        </>
      )}
    </section>
  );
}
