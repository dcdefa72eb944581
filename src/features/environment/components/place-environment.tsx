import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { formatCount, formatSigned } from '@shared/domain/format';
import { addDays } from '@shared/domain/tone/dates';
import type { PlaceEnvironment as Environment } from '@shared/types/environment';
import { lazy, Suspense, useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '@/components/ui/button';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { useAcknowledgePlaceAlert } from '@/lib/place-alerts-api';
import { environmentQueries } from '../api/environment-api';
import { EnvironmentFigures } from './environment-figures';
import { ReadingsUpload } from './readings-upload';

const EnvironmentChart = lazy(() => import('./environment-chart'));

const dayMs = (day: string) => Date.parse(`${day}T12:00:00Z`);

function Charts({ environment }: { environment: Environment }) {
  const { band } = environment;
  const raw = environment.readings;
  const temperature = raw
    ? raw.map((r) => ({ t: Date.parse(r.at), mean: r.temperatureC }))
    : environment.days.map((d) => ({
        t: dayMs(d.day),
        range: [d.temperature.min, d.temperature.max] as [number, number],
        mean: d.temperature.mean,
      }));
  const humidity = raw
    ? raw.map((r) => ({ t: Date.parse(r.at), mean: r.rh }))
    : environment.days.map((d) => ({
        t: dayMs(d.day),
        range: [d.rh.min, d.rh.max] as [number, number],
        mean: d.rh.mean,
      }));
  const what = raw ? 'each reading' : 'each day’s lowest to highest, with its mean';
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <figure className="rounded border border-paper-edge bg-white/60 p-2">
        <figcaption className="mb-1 text-sm">
          Temperature, °C ({what}); dashed: the band&apos;s top, {band.maxTemperatureC} °C
        </figcaption>
        <div className="h-48" aria-hidden="true" data-testid="temperature-chart">
          <Suspense fallback={null}>
            <EnvironmentChart
              points={temperature}
              unit="°C"
              limits={[band.maxTemperatureC]}
              colour="#8a4b2a"
            />
          </Suspense>
        </div>
      </figure>
      <figure className="rounded border border-paper-edge bg-white/60 p-2">
        <figcaption className="mb-1 text-sm">
          Relative humidity, % ({what}); dashed: the band, {band.minRh}–{band.maxRh} %
        </figcaption>
        <div className="h-48" aria-hidden="true" data-testid="humidity-chart">
          <Suspense fallback={null}>
            <EnvironmentChart
              points={humidity}
              unit="%"
              limits={[band.minRh, band.maxRh]}
              colour="#2f5d73"
            />
          </Suspense>
        </div>
      </figure>
    </div>
  );
}

function PrintsHere({ environment }: { environment: Environment }) {
  const prints = environment.prints;
  if (!prints) return null;
  return (
    <section aria-labelledby="environment-prints-heading" className="mt-4">
      <h3 id="environment-prints-heading" className="mb-1 text-lg">
        How its prints change
      </h3>
      <p className="mb-2 text-sm text-ink-soft">
        {formatCount(prints.count, 'print')} kept here and below; mean tone change{' '}
        <strong>
          {prints.meanRatePerYear === null
            ? '—'
            : `${formatSigned(prints.meanRatePerYear, 2)} ΔE00 a year`}
        </strong>{' '}
        (the fastest patch of each print with a trend).
      </p>
      {prints.items.length > 0 && (
        <table className="w-full text-sm">
          <thead>
            <tr className="text-left text-ink-soft">
              <th scope="col">Accession number</th>
              <th scope="col">Title</th>
              <th scope="col">Process</th>
              <th scope="col">Tone</th>
              <th scope="col" className="text-right">
                ΔE00 a year
              </th>
            </tr>
          </thead>
          <tbody>
            {prints.items.map((p) => (
              <tr key={p.id} className="border-t border-paper-edge">
                <td className="font-mono text-xs">{p.accessionNumber}</td>
                <td>
                  <Link to={paths.print(p.id)}>{p.title}</Link>
                </td>
                <td>{p.process}</td>
                <td>{p.toneStatus}</td>
                <td className="text-right tabular-nums">
                  {p.ratePerYear === null ? '—' : formatSigned(p.ratePerYear, 2)}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </section>
  );
}

/** The place's alerts not yet acknowledged, each with its button (conservators). */
function OpenAlerts({ environment }: { environment: Environment }) {
  const acknowledge = useAcknowledgePlaceAlert();
  const open = environment.alerts.filter((a) => !a.acknowledgedAt);
  if (open.length === 0) return null;
  return (
    <>
      <ul className="mt-3 flex flex-col gap-1 text-sm" aria-label="Open alerts">
        {open.map((a) => (
          <li key={a.id} className="flex flex-wrap items-center gap-2">
            <span className="text-alert">{a.reason}</span>
            <Button
              onClick={() => acknowledge.mutate(a.id)}
              disabled={acknowledge.isPending}
              aria-label={`Acknowledge: ${a.reason}`}
            >
              Acknowledge
            </Button>
          </li>
        ))}
      </ul>
      <ErrorNotice error={acknowledge.error} />
    </>
  );
}

/** A place's storage environment: its readings (or its nearest ancestor's), figures, chart, prints. */
export function PlaceEnvironment({ placeId }: { placeId: number }) {
  const can = useCan();
  const [weekEnd, setWeekEnd] = useState<string | null>(null);
  const environment = useQuery({
    ...environmentQueries.place(placeId, weekEnd ? addDays(weekEnd, -6) : '', weekEnd ?? ''),
    placeholderData: keepPreviousData,
  });
  const data = environment.data;
  return (
    <section aria-labelledby="environment-heading" className="mb-6">
      <h2 id="environment-heading" className="mb-2 text-xl">
        Storage environment
      </h2>
      <ErrorNotice error={environment.error} />
      {environment.isPending && <Loading label="Loading the readings…" />}
      {data && !data.source && (
        <p className="mb-3 text-sm text-ink-soft">
          No readings for this place or any place around it yet.
        </p>
      )}
      {data?.source && (
        <>
          <p className="mb-2 text-sm text-ink-soft" aria-live="polite">
            {data.source.inherited
              ? `No logger here: showing the readings of ${data.source.name} (${data.source.code}). `
              : ''}
            {data.from} to {data.to} · {formatCount(data.figures.readings, 'reading')} · held to{' '}
            {data.band.label} (ISO 18920, values from memory).
          </p>
          <div className="mb-3 flex flex-wrap items-end gap-2">
            <Button onClick={() => setWeekEnd(null)} aria-pressed={weekEnd === null}>
              The year
            </Button>
            <Button onClick={() => setWeekEnd(weekEnd ?? data.to)} aria-pressed={weekEnd !== null}>
              One week
            </Button>
            {weekEnd && (
              <DateField
                label="Week ending"
                value={weekEnd}
                onChange={(event) => event.target.value && setWeekEnd(event.target.value)}
                className="max-w-xs"
              />
            )}
          </div>
          <Charts environment={data} />
          <div className="mt-4">
            <EnvironmentFigures environment={data} />
          </div>
          <OpenAlerts environment={data} />
        </>
      )}
      {data && <PrintsHere environment={data} />}
      {can('environment:write') && (
        <div className="mt-4">
          <ReadingsUpload placeId={placeId} />
        </div>
      )}
    </section>
  );
}
