import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { CohortGroup } from '@shared/types/tone';

/**
 * Mean ΔE00 a year per group (wide bar) with its 95 % interval (a thin dark range bar drawn
 * over it on a second, hidden category axis so the two overlap).
 */
export default function CohortChart({ groups }: { groups: readonly CohortGroup[] }) {
  const data = groups
    .filter((g) => g.meanRatePerYear !== null)
    .map((g) => ({
      label: g.label,
      mean: Number(g.meanRatePerYear!.toFixed(3)),
      interval: g.interval
        ? [Number(g.interval.low.toFixed(3)), Number(g.interval.high.toFixed(3))]
        : null,
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
            <XAxis xAxisId="mean" dataKey="label" tick={{ fontSize: 11 }} interval={0} />
            <XAxis xAxisId="interval" dataKey="label" hide />
            <YAxis
              tick={{ fontSize: 11 }}
              label={{ value: 'ΔE00 a year', angle: -90, position: 'insideLeft', fontSize: 11 }}
            />
            <Tooltip
              formatter={(value, name) =>
                Array.isArray(value)
                  ? [`${value[0]} to ${value[1]}`, '95 % interval']
                  : [Number(value).toFixed(2), name === 'mean' ? 'mean ΔE00 a year' : name]
              }
            />
            <Bar xAxisId="mean" dataKey="mean" fill="#c9a98a" isAnimationActive={false} />
            <Bar
              xAxisId="interval"
              dataKey="interval"
              fill="#221d17"
              barSize={4}
              isAnimationActive={false}
            />
          </BarChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-xs text-ink-faint">
        Mean tone-change rate by group (bar) and its 95 % interval (dark line).
      </figcaption>
    </figure>
  );
}
