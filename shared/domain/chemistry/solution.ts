import { findChemical, molarMass, type KnownChemical } from './chemicals';

/** Percentages are weight per volume: grams of solute per 100 ml of finished solution. */
export interface SolutionRecipe {
  grams: number;
  molarMass: number;
  /** mol/L of the finished solution. */
  molarity: number;
}

/** Grams of solute, molar mass and molarity for a % w/v solution made up to `volumeMl`. */
export function solutionRecipe(
  chemical: KnownChemical,
  percent: number,
  volumeMl: number,
): SolutionRecipe {
  const grams = (percent / 100) * volumeMl;
  const mass = molarMass(chemical);
  return { grams, molarMass: mass, molarity: grams / mass / (volumeMl / 1000) };
}

/** Moles per litre of a % w/v solution. */
export function molarityOf(chemical: KnownChemical, percent: number): number {
  return (percent * 10) / molarMass(chemical);
}

/**
 * Grams of one form of a salt that carry the same moles as `grams` of another form
 * (anhydrous ↔ hydrate): the ratio of their molar masses.
 */
export function convertForm(grams: number, from: KnownChemical, to: KnownChemical): number {
  return (grams * molarMass(to)) / molarMass(from);
}

/** The pentahydrate and anhydrous sodium thiosulfate, for the fixer conversion. */
export function thiosulfateForms(): { anhydrous: KnownChemical; pentahydrate: KnownChemical } {
  return {
    anhydrous: findChemical('sodium thiosulfate')!,
    pentahydrate: findChemical('sodium thiosulfate pentahydrate')!,
  };
}
