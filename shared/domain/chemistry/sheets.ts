import { sheetAreaCm2 } from './units';

/** An 8×10 in sheet, the unit fixer capacity and sensitiser coverage are given in. */
export const EIGHT_BY_TEN_CM2 = sheetAreaCm2(8, 10, 'in');

/**
 * How many 8×10 in sheets a sheet of this size equals by area (four 4×5 in pieces make
 * one 8×10 in sheet, common practice). Unknown sizes count as one whole sheet, so a
 * bath's use is never under-counted.
 */
export function eightByTenEquivalents(widthMm: number | null, heightMm: number | null): number {
  if (!widthMm || !heightMm) return 1;
  return (widthMm * heightMm) / 100 / EIGHT_BY_TEN_CM2;
}

/**
 * Millilitres of sensitiser for `sheets` sheets of `areaCm2` each, with `coats` coats, at
 * `mlPer8x10` per coat on an 8×10 in sheet.
 */
export function sensitiserNeededMl(input: {
  sheets: number;
  areaCm2: number;
  coats: number;
  mlPer8x10: number;
}): number {
  return (input.sheets * input.areaCm2 * input.coats * input.mlPer8x10) / EIGHT_BY_TEN_CM2;
}
