/*
 * CIE 15:2004 (Colorimetry, 3rd ed.), §8.2.1: L* = 116 f(Y/Yn) − 16 with
 * f(t) = t^(1/3) above (6/29)^3, else t / (3 (6/29)^2) + 4/29. Inverted here for Y.
 */
const EPSILON = (6 / 29) ** 3;
const LINEAR_SLOPE = 3 * (6 / 29) ** 2;

/** Relative luminance Y (0–1, Yn = 1) of a CIE lightness L*. */
export function luminanceFromLightness(L: number): number {
  const f = (L + 16) / 116;
  return f > 6 / 29 ? f * f * f : LINEAR_SLOPE * (f - 4 / 29);
}

/** CIE lightness L* of a relative luminance Y (0–1). */
export function lightnessFromLuminance(Y: number): number {
  const f = Y > EPSILON ? Math.cbrt(Y) : Y / LINEAR_SLOPE + 4 / 29;
  return 116 * f - 16;
}

/** Smallest luminance used for density, so L* = 0 gives a finite (very deep) value. */
const MIN_LUMINANCE = 1e-6;

/** Visual reflection density D = −log10(Y), Y from L* (CIE 15). */
export function densityFromLightness(L: number): number {
  return -Math.log10(Math.max(luminanceFromLightness(L), MIN_LUMINANCE));
}
