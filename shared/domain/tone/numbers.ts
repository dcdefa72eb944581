/** Decimals for reflection density and its change, on screen, in reasons and in the PDF. */
export const DENSITY_DIGITS = 3;

/**
 * A number with a true minus sign or a plus; one that rounds to zero at `digits` reads as
 * plain zero ("0.00", never "−0.00" or "+0.00").
 */
export function signedFixed(value: number, digits: number): string {
  const text = Math.abs(value).toFixed(digits);
  if (Number(text) === 0) return text;
  return `${value > 0 ? '+' : '−'}${text}`;
}

/** A yearly rate: "+0.12 a year", "−0.05 a year", or "0.00 a year" when it rounds to zero. */
export function ratePerYear(value: number, digits = 2): string {
  return `${signedFixed(value, digits)} a year`;
}
