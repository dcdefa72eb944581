const WIDTH = 80;
const HEIGHT = 22;
/** Room above and below the line: drawn to the edge, a peak touched the row's border. */
const PAD = 3;

/** The polyline's points: values from 0 to `top` drawn between PAD and HEIGHT − PAD. */
export function sparkPoints(values: readonly number[], max: number): string {
  const top = Math.max(max, ...values);
  const span = HEIGHT - 2 * PAD;
  return values
    .map((v, i) => {
      const x = (i / (values.length - 1)) * WIDTH;
      const y = PAD + span - (v / top) * span;
      return `${x.toFixed(1)},${y.toFixed(1)}`;
    })
    .join(' ');
}

/** A small inline line of ΔE00 values; the numbers are given to screen readers as text. */
export function Sparkline({ values, max = 3 }: { values: readonly number[]; max?: number }) {
  if (values.length < 2) return <span className="text-xs text-ink-faint">—</span>;
  return (
    <span className="inline-flex items-center gap-1">
      <svg width={WIDTH} height={HEIGHT} aria-hidden="true" className="overflow-visible">
        <polyline
          points={sparkPoints(values, max)}
          fill="none"
          stroke="#6e4424"
          strokeWidth="1.5"
        />
      </svg>
      <span className="sr-only">ΔE00 over checks: {values.join(', ')}</span>
    </span>
  );
}
