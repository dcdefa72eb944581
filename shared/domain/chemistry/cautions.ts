import { cautionsFor, GENERAL_PRECAUTIONS } from '../chemical-cautions';

/** The plain statement every chemistry result carries. */
export const NOT_A_SUBSTITUTE =
  'This calculation does not replace the chemical’s safety data sheet, local regulations or licensed practice: read the data sheet and follow local rules first.';

export const WASTE_CAUTION =
  'Keep silver-bearing waste and used fixer out of drains; collect them for silver recovery or disposal under local rules.';

/** The cautions for a solution of these chemicals, as plain sentences, statement last. */
export function solutionCautions(chemicals: readonly string[]): string[] {
  return [
    ...cautionsFor(chemicals).map((item) => `${item.chemical}: ${item.caution}`),
    GENERAL_PRECAUTIONS,
    WASTE_CAUTION,
    NOT_A_SUBSTITUTE,
  ];
}
