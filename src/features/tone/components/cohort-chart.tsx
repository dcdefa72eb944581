import {
  Bar,
  BarChart,
  CartesianGrid,
  ErrorBar,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { withMinusSign } from '@shared/domain/format';
import type { CohortGroup } from '@shared/types/tone';

/** Mean ΔE00 a year per group (bar) with its 95 % interval drawn as whiskers. */
export default function CohortChart({ groups }: { groups: readonly CohortGroup[] }) {
  const data = groups
    .filter((g) => g.meanRatePerYear !== null)
    .map((g) => ({
      label: g.label,
      mean: Number(g.meanRatePerYear!.toFixed(3)),
      // Whiskers are offsets below and above the mean.
      error: g.interval
        ? [
            Number((g.meanRatePerYear! - g.interval.low).toFixed(3)),
            Number((g.interval.high - g.meanRatePerYear!).toFixed(3)),
          ]
        : [0, 0],
    }));
  return (
    <figure>
      <div className="h-64" aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart
            accessibilityLayer={false}
            data={data}
            margin={{ top: 8, right: 8, bottom: 8, left: 0 }}
          >
            <CartesianGrid stroke="#ded2bb" strokeDasharray="2 4" vertical={false} />
            <XAxis dataKey="label" tick={{ fontSize: 11 }} interval={0} />
            <YAxis
              tick={{ fontSize: 11 }}
              tickFormatter={(value: number) => withMinusSign(String(value))}
              label={{ value: 'ΔE00 a year', angle: -90, position: 'insideLeft', fontSize: 11 }}
            />
            <Tooltip
              formatter={(value) => [withMinusSign(Number(value).toFixed(2)), 'mean ΔE00 a year']}
            />
            <Bar dataKey="mean" fill="#c9a98a" isAnimationActive={false}>
              <ErrorBar dataKey="error" width={10} strokeWidth={2} stroke="#221d17" />
            </Bar>
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-xs text-ink-faint">
        Mean tone-change rate by group (bar) and its 95 % interval (whiskers).
      </figcaption>
    </figure>
  );
}
