/** One inch is exactly 25.4 mm (international inch, 1959; NIST SP 811 appendix B). */
export const MM_PER_INCH = 25.4;

export type LengthUnit = 'mm' | 'in';

export function mmToInches(mm: number): number {
  return mm / MM_PER_INCH;
}

export function inchesToMm(inches: number): number {
  return inches * MM_PER_INCH;
}

/** A length for people: whole-ish millimetres, or inches to the hundredth. */
export function formatLength(mm: number, unit: LengthUnit): string {
  if (unit === 'in') return `${round(mmToInches(mm), 2)} in`;
  return `${round(mm, 1)} mm`;
}

/** "101.6 × 127 mm", or null when either side is unknown. */
export function formatSize(
  widthMm: number | null | undefined,
  heightMm: number | null | undefined,
  unit: LengthUnit,
): string | null {
  if (widthMm == null || heightMm == null) return null;
  if (unit === 'in')
    return `${round(mmToInches(widthMm), 2)} × ${round(mmToInches(heightMm), 2)} in`;
  return `${round(widthMm, 1)} × ${round(heightMm, 1)} mm`;
}

function round(value: number, places: number): number {
  const factor = 10 ** places;
  return Math.round(value * factor) / factor;
}
