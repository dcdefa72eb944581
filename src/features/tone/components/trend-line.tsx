import { formatDate } from '@shared/domain/format';
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

/** Room right of the plot for the longest threshold label ("noticeable" at 10 px). */
const LABEL_MARGIN = 58;

const year = (ms: number) => new Date(ms).getUTCFullYear().toString();

/** One tick on 1 January of each year the series spans. */
function yearTicks(times: number[]): number[] {
  const first = new Date(Math.min(...times)).getUTCFullYear();
  const last = new Date(Math.max(...times)).getUTCFullYear();
  const ticks: number[] = [];
  for (let y = first; y <= last + 1; y += 1) ticks.push(Date.UTC(y, 0, 1));
  return ticks;
}

export interface TrendLineProps {
  data: Array<{ t: number; dE00: number }>;
  top: number;
  watchDE00: number;
  noticeableDE00: number;
}

/**
 * One patch's ΔE00 line with the watch and noticeable thresholds: the only part of the tone
 * record that needs recharts, loaded on its own when its chart comes near the screen.
 */
export default function TrendLine({ data, top, watchDE00, noticeableDE00 }: TrendLineProps) {
  return (
    <ResponsiveContainer width="100%" height="100%">
      <LineChart
        accessibilityLayer={false}
        data={data}
        margin={{ top: 6, right: LABEL_MARGIN, bottom: 0, left: -18 }}
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
        {/* Labels in the right margin, outside the plot: inside it they covered the latest
            points (at the right) or, on a fast-changing print, the early ones (at the left). */}
        <ReferenceLine
          y={watchDE00}
          stroke="#6e4424"
          strokeDasharray="4 3"
          // Nudged apart, so the two stay readable when the lines lie close on a tall scale.
          label={{ value: 'watch', fontSize: 10, position: 'right', dy: 4 }}
        />
        <ReferenceLine
          y={noticeableDE00}
          stroke="#9b2c1c"
          strokeDasharray="4 3"
          label={{ value: 'noticeable', fontSize: 10, position: 'right', dy: -4 }}
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
  );
}
