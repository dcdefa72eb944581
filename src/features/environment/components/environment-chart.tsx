import {
  Area,
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';

export interface EnvironmentChartProps {
  /** One point a day (range band and mean) or one point a reading (week view). */
  points: Array<{ t: number; range?: [number, number]; mean: number }>;
  unit: string;
  /** Band limits to draw as lines. */
  limits: number[];
  colour: string;
}

const day = (ms: number) => new Date(ms).toISOString().slice(0, 10);
const dayAndHour = (ms: number) => new Date(ms).toISOString().slice(5, 16).replace('T', ' ');

/**
 * A place's temperature or humidity over time: each day's range as a band with its mean as a
 * line, or — for a week — the readings themselves. At most a few thousand points: days for
 * any period longer than a week.
 */
export default function EnvironmentChart({ points, unit, limits, colour }: EnvironmentChartProps) {
  const times = points.map((p) => p.t);
  const span = times.length ? Math.max(...times) - Math.min(...times) : 0;
  const short = span <= 8 * 86_400_000;
  return (
    <ResponsiveContainer width="100%" height="100%">
      <ComposedChart
        accessibilityLayer={false}
        data={points}
        margin={{ top: 6, right: 8, bottom: 0, left: 0 }}
      >
        <CartesianGrid stroke="#ded2bb" strokeDasharray="2 4" />
        <XAxis
          dataKey="t"
          type="number"
          scale="time"
          domain={['dataMin', 'dataMax']}
          tickFormatter={short ? dayAndHour : day}
          tick={{ fontSize: 11 }}
          minTickGap={40}
        />
        <YAxis
          domain={['auto', 'auto']}
          tick={{ fontSize: 11 }}
          width={44}
          tickFormatter={(value: number) => `${Number(value).toFixed(0)}${unit}`}
        />
        {limits.map((limit) => (
          <ReferenceLine key={limit} y={limit} stroke="#a23b2a" strokeDasharray="4 3" />
        ))}
        <Tooltip
          labelFormatter={(value) => (short ? dayAndHour(Number(value)) : day(Number(value)))}
          formatter={(value) =>
            Array.isArray(value)
              ? `${Number(value[0]).toFixed(1)}–${Number(value[1]).toFixed(1)} ${unit}`
              : `${Number(value).toFixed(1)} ${unit}`
          }
        />
        {points.some((p) => p.range) && (
          <Area
            dataKey="range"
            stroke="none"
            fill={colour}
            fillOpacity={0.25}
            isAnimationActive={false}
            name="Day's range"
          />
        )}
        <Line
          dataKey="mean"
          stroke={colour}
          dot={false}
          strokeWidth={1.5}
          isAnimationActive={false}
          name={short ? 'Reading' : 'Day’s mean'}
        />
      </ComposedChart>
    </ResponsiveContainer>
  );
}
