import { findChemical, molarMass, type KnownChemical } from './chemicals';

/** Where the solubility limits come from, shown beside every warning. */
export const SOLUBILITY_SOURCE =
  'CRC Handbook of Chemistry and Physics, “Aqueous solubility of inorganic compounds at various temperatures” (g per 100 g water at 20 °C), with the density of the saturated solution from its “Concentrative properties of aqueous solutions”; values from memory, not checked against a copy';

/** A saturated solution at 20 °C: solute per 100 g of water and the solution's density. */
interface SaturatedSolution {
  gramsPer100gWater: number;
  /** g/ml of the saturated solution at 20 °C. */
  density: number;
}

// From memory (see SOLUBILITY_SOURCE). Chemicals without a row get no warning: citric acid
// and gold chloride dissolve far beyond any working strength, silver nitrate likewise
// (about 216 g per 100 g water at 20 °C, well over 100 % w/v).
const SATURATED_AT_20C: Record<string, SaturatedSolution> = {
  'sodium chloride': { gramsPer100gWater: 35.9, density: 1.197 },
  'ammonium chloride': { gramsPer100gWater: 37.2, density: 1.076 },
  'sodium thiosulfate': { gramsPer100gWater: 70.1, density: 1.39 },
  'sodium sulfite': { gramsPer100gWater: 26.4, density: 1.2 },
};

/**
 * The most of a chemical that 100 ml of solution can hold at 20 °C, in % w/v (g per 100 ml),
 * or null when the table has no limit for it. Mass fraction w = S / (100 + S) times the
 * saturated solution's density gives grams per millilitre. A hydrate is weighed as the
 * hydrate, so its limit is the anhydrous limit scaled by the ratio of molar masses.
 */
export function solubilityLimitPercent(chemical: KnownChemical): number | null {
  const anhydrous = chemical.anhydrous ? findChemical(chemical.anhydrous) : chemical;
  const row = anhydrous ? SATURATED_AT_20C[anhydrous.name] : undefined;
  if (!anhydrous || !row) return null;
  const { gramsPer100gWater: s, density } = row;
  const limit = (s / (100 + s)) * density * 100;
  return chemical === anhydrous ? limit : (limit * molarMass(chemical)) / molarMass(anhydrous);
}

/** A warning for a strength above what water dissolves at 20 °C, or null. */
export interface SolubilityWarning {
  kind: 'solubility';
  limitPercent: number;
  message: string;
  source: string;
}

/** Warns when `percent` (w/v) is more than the chemical's solubility at 20 °C allows. */
export function solubilityWarning(
  chemical: KnownChemical,
  percent: number,
): SolubilityWarning | null {
  const limit = solubilityLimitPercent(chemical);
  if (limit === null || percent <= limit) return null;
  const shown = Math.floor(limit * 10) / 10;
  return {
    kind: 'solubility',
    limitPercent: limit,
    message: `${percent} % w/v is more ${chemical.name} than water dissolves at 20 °C (about ${shown} % w/v at most): the rest will stay undissolved. Check the recipe.`,
    source: SOLUBILITY_SOURCE,
  };
}
