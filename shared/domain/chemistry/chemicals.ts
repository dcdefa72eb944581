import type { BatchKind } from '../vocabulary';
import { molarMassOf, type Composition } from './atomic-weights';

/** A chemical the solution maker knows: its formula and the batch kind it usually makes. */
export interface KnownChemical {
  name: string;
  formula: string;
  composition: Composition;
  /** The batch kind a solution of it usually is (for "save as a batch"). */
  kind: BatchKind;
  /** Other kinds of batch it is also made into (common practice), beside `kind`. */
  alsoKinds?: readonly BatchKind[];
  /** The anhydrous form, for hydrates (so the two can be converted). */
  anhydrous?: string;
}

const water = (n: number): Composition => ({ H: 2 * n, O: n });
const plus = (a: Composition, b: Composition): Composition => {
  const sum: Composition = { ...a };
  for (const [element, count] of Object.entries(b) as Array<[keyof Composition, number]>) {
    sum[element] = (sum[element] ?? 0) + count;
  }
  return sum;
};

const THIOSULFATE: Composition = { Na: 2, S: 2, O: 3 };

export const KNOWN_CHEMICALS: readonly KnownChemical[] = [
  { name: 'sodium chloride', formula: 'NaCl', composition: { Na: 1, Cl: 1 }, kind: 'salting' },
  {
    name: 'ammonium chloride',
    formula: 'NH₄Cl',
    composition: { N: 1, H: 4, Cl: 1 },
    kind: 'salting',
  },
  {
    name: 'silver nitrate',
    formula: 'AgNO₃',
    composition: { Ag: 1, N: 1, O: 3 },
    kind: 'sensitiser',
  },
  { name: 'sodium thiosulfate', formula: 'Na₂S₂O₃', composition: THIOSULFATE, kind: 'fixer' },
  {
    name: 'sodium thiosulfate pentahydrate',
    formula: 'Na₂S₂O₃·5H₂O',
    composition: plus(THIOSULFATE, water(5)),
    kind: 'fixer',
    anhydrous: 'sodium thiosulfate',
  },
  {
    name: 'sodium sulfite',
    formula: 'Na₂SO₃',
    composition: { Na: 2, S: 1, O: 3 },
    kind: 'clearing agent',
    alsoKinds: ['fixer'],
  },
  {
    name: 'citric acid',
    formula: 'C₆H₈O₇',
    composition: { C: 6, H: 8, O: 7 },
    kind: 'sensitiser',
    alsoKinds: ['salting'],
  },
  {
    name: 'gold chloride',
    formula: 'HAuCl₄·3H₂O',
    composition: plus({ H: 1, Au: 1, Cl: 4 }, water(3)),
    kind: 'toner',
  },
];

export const KNOWN_CHEMICAL_NAMES = KNOWN_CHEMICALS.map((chemical) => chemical.name);

/** The chemical of that name (case and spacing ignored), or null. */
export function findChemical(name: string): KnownChemical | null {
  const wanted = name.trim().toLowerCase().replace(/\s+/g, ' ');
  return KNOWN_CHEMICALS.find((chemical) => chemical.name === wanted) ?? null;
}

/** Molar mass in g/mol of a known chemical. */
export function molarMass(chemical: KnownChemical): number {
  return molarMassOf(chemical.composition);
}

/** The batch kinds a chemical is made into; every kind for a chemical the app does not know. */
export function batchKindsFor(name: string): readonly BatchKind[] | null {
  const chemical = findChemical(name);
  return chemical ? [chemical.kind, ...(chemical.alsoKinds ?? [])] : null;
}

/**
 * Why a batch of that kind cannot hold that chemical (sodium thiosulfate is no sensitiser),
 * or null when it fits or the chemical is not one the app knows.
 */
export function batchKindProblem(kind: BatchKind, chemicalName: string): string | null {
  const kinds = batchKindsFor(chemicalName);
  if (!kinds || kinds.includes(kind)) return null;
  const name = findChemical(chemicalName)!.name;
  const fits = kinds.join(' or ');
  return `A batch of ${name} is a ${fits}, not a ${kind}. Choose the kind ${fits}.`;
}
