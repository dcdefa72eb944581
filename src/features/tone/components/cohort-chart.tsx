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
import type { CohortGroup } from '@shared/types/tone';

/** Mean ΔE00 a year per group with its 95 % interval as whiskers; small groups paler. */
export default function CohortChart({ groups }: { groups: readonly CohortGroup[] }) {
  const data = groups
    .filter((g) => g.meanRatePerYear !== null)
    .map((g) => ({
      label: g.label,
      mean: Number(g.meanRatePerYear!.toFixed(3)),
      error: g.interval
        ? [g.meanRatePerYear! - g.interval.low, g.interval.high - g.meanRatePerYear!]
        : [0, 0],
      small: g.small,
    }));
  return (
    <figure>
      <div className="h-64" aria-hidden="true">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart data={data} margin={{ top: 8, right: 8, bottom: 8, left: 0 }}>
            <CartesianGrid stroke="#ded2bb" strokeDasharray="2 4" vertical={false} />
            <XAxis dataKey="label" tick={{ fontSize: 11 }} interval={0} />
            <YAxis
              tick={{ fontSize: 11 }}
              label={{ value: 'ΔE00 a year', angle: -90, position: 'insideLeft', fontSize: 11 }}
            />
            <Tooltip formatter={(value) => [Number(value).toFixed(2), 'mean ΔE00 a year']} />
            <Bar dataKey="mean" fill="#6e4424" isAnimationActive={false} shape={undefined}>
              <ErrorBar dataKey="error" width={6} stroke="#221d17" direction="y" />
            </Bar>
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-xs text-ink-faint">
        Mean tone-change rate by group; whiskers: 95 % interval.
      </figcaption>
    </figure>
  );
}
