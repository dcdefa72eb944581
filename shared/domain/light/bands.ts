import { formatNumber } from '../format';

/**
 * Bands of lifetime light dose for grouping tone change (Insights, `/api/cohorts?by=light`),
 * around CIE 157:2004's annual figures for highly responsive (15,000 lx·h) and medium
 * (150,000 lx·h) materials, values from memory.
 */
export const LIGHT_BANDS = [
  { key: 'dark', upTo: 0, label: 'Never on display' },
  { key: 'lt15k', upTo: 15_000, label: `Up to ${formatNumber(15_000)} lx·h` },
  { key: '15k-50k', upTo: 50_000, label: `${formatNumber(15_000)}–${formatNumber(50_000)} lx·h` },
  {
    key: '50k-150k',
    upTo: 150_000,
    label: `${formatNumber(50_000)}–${formatNumber(150_000)} lx·h`,
  },
  { key: 'ge150k', upTo: Infinity, label: `Over ${formatNumber(150_000)} lx·h` },
] as const;

/** The band of a lifetime dose (a dose on a band's upper edge belongs to that band). */
export function lightBand(luxHours: number): { key: string; label: string } {
  const band = LIGHT_BANDS.find((candidate) => luxHours <= candidate.upTo)!;
  return { key: band.key, label: band.label };
}
