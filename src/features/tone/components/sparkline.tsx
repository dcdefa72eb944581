/** A small inline line of ΔE00 values; the numbers are given to screen readers as text. */
export function Sparkline({ values, max = 3 }: { values: readonly number[]; max?: number }) {
  if (values.length < 2) return <span className="text-xs text-ink-faint">—</span>;
  const width = 80;
  const height = 22;
  const top = Math.max(max, ...values);
  const points = values
    .map(
      (v, i) =>
        `${((i / (values.length - 1)) * width).toFixed(1)},${(height - (v / top) * height).toFixed(1)}`,
    )
    .join(' ');
  return (
    <span className="inline-flex items-center gap-1">
      <svg width={width} height={height} aria-hidden="true" className="overflow-visible">
        <polyline points={points} fill="none" stroke="#6e4424" strokeWidth="1.5" />
      </svg>
      <span className="sr-only">ΔE00 over checks: {values.join(', ')}</span>
    </span>
  );
}
