/**
 * US customary units for the solution maker. Exact by definition (NIST Handbook 44,
 * Appendix C): 1 US fluid ounce = 1/128 US gallon = 231/128 in³ = 29.5735295625 ml;
 * 1 avoirdupois ounce = 28.349523125 g; 1 grain = 64.79891 mg; 1 inch = 25.4 mm.
 */
export const ML_PER_US_FLUID_OUNCE = 29.5735295625;
export const GRAMS_PER_OUNCE = 28.349523125;
export const GRAMS_PER_GRAIN = 0.06479891;
export const MM_PER_INCH = 25.4;

export type VolumeUnit = 'ml' | 'fl oz';
export type MassUnit = 'g' | 'oz' | 'gr';
export type SheetUnit = 'in' | 'cm';

export function toMillilitres(value: number, unit: VolumeUnit): number {
  return unit === 'ml' ? value : value * ML_PER_US_FLUID_OUNCE;
}

export function fromMillilitres(ml: number, unit: VolumeUnit): number {
  return unit === 'ml' ? ml : ml / ML_PER_US_FLUID_OUNCE;
}

export function fromGrams(grams: number, unit: MassUnit): number {
  if (unit === 'oz') return grams / GRAMS_PER_OUNCE;
  if (unit === 'gr') return grams / GRAMS_PER_GRAIN;
  return grams;
}

/** Square centimetres of a sheet given in inches or centimetres. */
export function sheetAreaCm2(width: number, height: number, unit: SheetUnit): number {
  const toCm = unit === 'in' ? MM_PER_INCH / 10 : 1;
  return width * toCm * height * toCm;
}
