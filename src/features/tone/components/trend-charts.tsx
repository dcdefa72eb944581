import { formatDate } from '@shared/domain/format';
import { todayIso } from '@shared/domain/tone/check-date';
import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { ToneTrendResponse } from '@shared/types/tone';
import { ratePerYear } from '@shared/domain/tone/numbers';
import { projectionWords } from '@shared/domain/tone/projection-words';
import { patchLabel } from './format';

const time = (date: string) => Date.parse(`${date}T00:00:00Z`);
const year = (ms: number) => new Date(ms).getUTCFullYear().toString();

/** One tick on 1 January of each year the series spans. */
function yearTicks(times: number[]): number[] {
  const first = new Date(Math.min(...times)).getUTCFullYear();
  const last = new Date(Math.max(...times)).getUTCFullYear();
  const ticks: number[] = [];
  for (let y = first; y <= last + 1; y += 1) ticks.push(Date.UTC(y, 0, 1));
  return ticks;
}

/** ΔE00 against the baseline over time, one small chart per patch, thresholds drawn. */
export default function TrendCharts({ trend }: { trend: ToneTrendResponse }) {
  const { watchDE00, noticeableDE00, projectionYears } = trend.thresholds;
  const top = Math.max(
    noticeableDE00 * 1.25,
    ...trend.patches.flatMap((p) => p.series.map((point) => point.dE00 * 1.1)),
  );
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      {trend.patches.map((patch) => {
        const data = patch.series.map((point) => ({ t: time(point.checkedOn), dE00: point.dE00 }));
        const slope = patch.slopePerYear?.dE00;
        const projection = projectionWords({
          latestDE00: patch.series.at(-1)?.dE00 ?? 0,
          projectedOn: patch.projectedNoticeableOn,
          hasTrend: slope !== undefined,
          noticeableDE00,
          horizonYears: projectionYears,
          today: todayIso(),
        });
        return (
          <figure key={patch.patch} className="rounded border border-paper-edge bg-white/60 p-2">
            <figcaption className="mb-1 text-sm">
              <span className="font-semibold">{patchLabel(patch.patch)}</span>
              <span className="text-ink-faint">
                {slope === undefined
                  ? ' · fewer than 3 checks: no trend yet'
                  : ` · ΔE00 ${ratePerYear(slope)}`}
                {projection && ` · ${projection}`}
              </span>
            </figcaption>
            <div className="h-40" aria-hidden="true">
              <ResponsiveContainer width="100%" height="100%">
                <LineChart
                  accessibilityLayer={false}
                  data={data}
                  margin={{ top: 6, right: 8, bottom: 0, left: -18 }}
                >
                  <CartesianGrid stroke="#ded2bb" strokeDasharray="2 4" />
                  <XAxis
                    dataKey="t"
                    type="number"
                    scale="time"
                    domain={[Math.min(...data.map((d) => d.t)), Math.max(...data.map((d) => d.t))]}
                    ticks={yearTicks(data.map((d) => d.t)).filter(
                      (tick) =>
                        tick >= Math.min(...data.map((d) => d.t)) &&
                        tick <= Math.max(...data.map((d) => d.t)),
                    )}
                    tickFormatter={year}
                    tick={{ fontSize: 11 }}
                  />
                  <YAxis domain={[0, Number(top.toFixed(1))]} tick={{ fontSize: 11 }} />
                  <ReferenceLine
                    y={watchDE00}
                    stroke="#6e4424"
                    strokeDasharray="4 3"
                    label={{ value: 'watch', fontSize: 10, position: 'insideTopRight' }}
                  />
                  <ReferenceLine
                    y={noticeableDE00}
                    stroke="#9b2c1c"
                    strokeDasharray="4 3"
                    label={{ value: 'noticeable', fontSize: 10, position: 'insideTopRight' }}
                  />
                  <Tooltip
                    labelFormatter={(value) =>
                      formatDate(new Date(Number(value)).toISOString().slice(0, 10), true)
                    }
                    formatter={(value) => [Number(value).toFixed(2), 'ΔE00']}
                  />
                  <Line
                    type="monotone"
                    dataKey="dE00"
                    stroke="#221d17"
                    strokeWidth={1.5}
                    dot={{ r: 3 }}
                    isAnimationActive={false}
                  />
                </LineChart>
              </ResponsiveContainer>
            </div>
            <p className="sr-only">
              ΔE00 at each check:{' '}
              {patch.series
                .map((p) => `${formatDate(p.checkedOn)} ${p.dE00.toFixed(2)}`)
                .join(', ')}
            </p>
          </figure>
        );
      })}
    </div>
  );
}
