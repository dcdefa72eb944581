/**
 * Standard atomic weights of the elements the darkroom's chemicals contain, from the IUPAC
 * table "Atomic weights of the elements 2007" (M. E. Wieser and T. B. Coplen, Pure Appl.
 * Chem. 83 (2011) 359–396). It is the last IUPAC table that gives one value, not an
 * interval, for H, N, O, S and Cl; later tables (2009 onward) give intervals whose
 * conventional values differ in the fourth significant figure at most.
 */
export const ATOMIC_WEIGHTS_SOURCE =
  'IUPAC standard atomic weights, table of 2007 (Wieser & Coplen, Pure Appl. Chem. 83 (2011) 359–396)';

export const ATOMIC_WEIGHTS = {
  H: 1.00794,
  C: 12.0107,
  N: 14.0067,
  O: 15.9994,
  Na: 22.98976928,
  S: 32.065,
  Cl: 35.453,
  K: 39.0983,
  Ag: 107.8682,
  Au: 196.966569,
} as const;

export type Element = keyof typeof ATOMIC_WEIGHTS;

/** Atoms of each element in one formula unit, water of crystallisation included. */
export type Composition = Partial<Record<Element, number>>;

/** Molar mass in g/mol of a formula unit. */
export function molarMassOf(composition: Composition): number {
  return Object.entries(composition).reduce(
    (sum, [element, count]) => sum + ATOMIC_WEIGHTS[element as Element] * (count ?? 0),
    0,
  );
}
