import { formatSigned } from '@shared/domain/format';
import type { PatchComparison } from '@shared/domain/tone/comparison';
import { DENSITY_DIGITS } from '@shared/domain/tone/numbers';
import { patchLabel } from './format';

/** Per patch against the baseline: ΔL*, Δa*, Δb*, ΔE76, ΔE94, ΔE00, density and ΔD. */
export function ComparisonTable({
  rows,
  caption,
}: {
  rows: readonly PatchComparison[];
  caption: string;
}) {
  if (rows.length === 0) return null;
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm tabular-nums">
        <caption className="mb-1 text-left text-sm text-ink-soft">{caption}</caption>
        <thead>
          <tr className="border-b border-paper-edge text-left text-xs text-ink-faint">
            <th scope="col" className="py-1 pr-3">
              Patch
            </th>
            <th scope="col" className="px-2 text-right">
              ΔL*
            </th>
            <th scope="col" className="px-2 text-right">
              Δa*
            </th>
            <th scope="col" className="px-2 text-right">
              Δb*
            </th>
            <th scope="col" className="px-2 text-right">
              ΔE*ab
            </th>
            <th scope="col" className="px-2 text-right">
              ΔE*94
            </th>
            <th scope="col" className="px-2 text-right">
              ΔE00
            </th>
            <th scope="col" className="px-2 text-right">
              D
            </th>
            <th scope="col" className="pl-2 text-right">
              ΔD
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.patch} className="border-b border-paper-edge/60">
              <th scope="row" className="py-1 pr-3 text-left font-normal">
                {patchLabel(row.patch)}
              </th>
              <td className="px-2 text-right">{formatSigned(row.dL, 1)}</td>
              <td className="px-2 text-right">{formatSigned(row.da, 1)}</td>
              <td className="px-2 text-right">{formatSigned(row.db, 1)}</td>
              <td className="px-2 text-right">{row.dE76.toFixed(2)}</td>
              <td className="px-2 text-right">{row.dE94.toFixed(2)}</td>
              <td className="px-2 text-right font-semibold">{row.dE00.toFixed(2)}</td>
              <td className="px-2 text-right">{row.density.toFixed(DENSITY_DIGITS)}</td>
              <td className="pl-2 text-right">{formatSigned(row.dDensity, DENSITY_DIGITS)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
