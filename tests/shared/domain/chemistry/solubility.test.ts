import { describe, expect, it } from 'vitest';
import { batchKindProblem, findChemical } from '../../../../shared/domain/chemistry/chemicals';
import {
  solubilityLimitPercent,
  solubilityWarning,
} from '../../../../shared/domain/chemistry/solubility';

const chemical = (name: string) => findChemical(name)!;

describe('solubility limit at 20 °C', () => {
  // CRC Handbook, aqueous solubility of inorganic compounds: NaCl 35.9 g/100 g water at 20 °C
  // (26.4 mass %), saturated brine 1.197 g/ml — from memory. Worked by hand: 0.2642 × 1.197
  // × 100 = 31.6 g per 100 ml, i.e. about 316 g of salt in a litre of saturated brine
  // (the usual figure for saturated brine, 316–318 g/L, common practice).
  it('puts sodium chloride at about 31.6 % w/v', () => {
    expect(solubilityLimitPercent(chemical('sodium chloride'))).toBeCloseTo(31.6, 1);
  });

  // The pentahydrate carries 248.18 / 158.11 of the anhydrous mass (IUPAC 2007 weights), so
  // its limit in % w/v of the crystals weighed is the anhydrous limit times that ratio.
  it('scales the thiosulfate limit to the pentahydrate by molar mass', () => {
    const anhydrous = solubilityLimitPercent(chemical('sodium thiosulfate'))!;
    const penta = solubilityLimitPercent(chemical('sodium thiosulfate pentahydrate'))!;
    expect(penta / anhydrous).toBeCloseTo(248.18 / 158.11, 3);
  });

  it('has no limit for a chemical the table does not hold', () => {
    expect(solubilityLimitPercent(chemical('gold chloride'))).toBeNull();
    expect(solubilityWarning(chemical('silver nitrate'), 100)).toBeNull();
  });
});

describe('solubility warning', () => {
  it('warns at 40 % w/v sodium chloride, above what water dissolves', () => {
    const warning = solubilityWarning(chemical('sodium chloride'), 40);
    expect(warning?.message).toMatch(/more sodium chloride than water dissolves at 20 °C/);
    expect(warning?.message).toMatch(/about 31\.6 % w\/v/);
    expect(warning?.source).toMatch(/CRC Handbook.*from memory/);
  });

  // A 2 % salting bath and a 15 % fixer are everyday strengths (common practice).
  it('says nothing at working strengths', () => {
    expect(solubilityWarning(chemical('sodium chloride'), 2)).toBeNull();
    expect(solubilityWarning(chemical('sodium thiosulfate'), 15)).toBeNull();
    expect(solubilityWarning(chemical('sodium chloride'), 31)).toBeNull();
  });
});

describe('batch kind and chemical', () => {
  // Sodium thiosulfate fixes; silver nitrate sensitises; salt salts (common practice).
  it('refuses a sensitiser of sodium thiosulfate', () => {
    expect(batchKindProblem('sensitiser', 'sodium thiosulfate')).toMatch(
      /sodium thiosulfate is a fixer, not a sensitiser/,
    );
    expect(batchKindProblem('fixer', 'Sodium  Thiosulfate')).toBeNull();
    expect(batchKindProblem('salting', 'sodium chloride')).toBeNull();
  });

  it('leaves a chemical it does not know alone', () => {
    expect(batchKindProblem('toner', 'selenium toner')).toBeNull();
  });
});
