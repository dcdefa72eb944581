import { molarityOf } from './solution';
import type { KnownChemical } from './chemicals';

/**
 * Silver-to-chloride molar ratio of a sensitiser over a salting solution, taking equal
 * volumes of each per area of paper. The reaction NaCl + AgNO₃ → AgCl + NaNO₃ (and
 * NH₄Cl + AgNO₃ → AgCl + NH₄NO₃) uses one silver per chloride, so a ratio above 1 leaves
 * free silver nitrate, which a printing-out paper needs (common practice). Null when the
 * pair is not a chloride and a silver salt.
 */
export function silverToChlorideRatio(
  salting: { chemical: KnownChemical; percent: number },
  sensitiser: { chemical: KnownChemical; percent: number },
): number | null {
  const chloride =
    molarityOf(salting.chemical, salting.percent) * chloridesPerUnit(salting.chemical);
  const silver =
    molarityOf(sensitiser.chemical, sensitiser.percent) * (sensitiser.chemical.composition.Ag ?? 0);
  if (chloride <= 0 || silver <= 0) return null;
  return silver / chloride;
}

function chloridesPerUnit(chemical: KnownChemical): number {
  return chemical.composition.Cl ?? 0;
}
