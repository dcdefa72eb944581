import { describe, expect, it } from 'vitest';
import { findChemical } from '../../../../shared/domain/chemistry/chemicals';
import { silverToChlorideRatio } from '../../../../shared/domain/chemistry/salting-ratio';
import {
  convertForm,
  solutionRecipe,
  thiosulfateForms,
} from '../../../../shared/domain/chemistry/solution';

const chemical = (name: string) => findChemical(name)!;

describe('solution recipe', () => {
  it('takes 12 g of silver nitrate for 100 ml of a 12 % sensitiser (common practice)', () => {
    expect(solutionRecipe(chemical('silver nitrate'), 12, 100).grams).toBeCloseTo(12, 10);
  });

  it('takes 20 g of salt for a litre of a 2 % salting solution (common practice)', () => {
    expect(solutionRecipe(chemical('sodium chloride'), 2, 1000).grams).toBeCloseTo(20, 10);
  });

  // Amount concentration c = n / V (IUPAC Gold Book, "amount concentration"), worked by
  // hand: 12 g / 169.87 g/mol / 0.1 L = 0.7064 mol/L; 20 g / 58.44 g/mol / 1 L = 0.3422.
  it('gives the molarity of the finished solution', () => {
    expect(solutionRecipe(chemical('silver nitrate'), 12, 100).molarity).toBeCloseTo(0.7064, 3);
    expect(solutionRecipe(chemical('sodium chloride'), 2, 1000).molarity).toBeCloseTo(0.3422, 3);
  });

  it('does not change the molarity with the volume made', () => {
    const small = solutionRecipe(chemical('sodium thiosulfate'), 15, 250);
    const large = solutionRecipe(chemical('sodium thiosulfate'), 15, 2000);
    expect(small.molarity).toBeCloseTo(large.molarity, 12);
    expect(large.grams / small.grams).toBeCloseTo(8, 12);
  });
});

describe('thiosulfate forms', () => {
  // Darkroom handbooks convert anhydrous to crystalline hypo by a factor of about 1.57
  // (from memory; it is 248.18 / 158.11).
  it('weighs 1.57 g of pentahydrate for each gram of anhydrous salt, and back', () => {
    const { anhydrous, pentahydrate } = thiosulfateForms();
    expect(convertForm(1, anhydrous, pentahydrate)).toBeCloseTo(1.57, 2);
    expect(convertForm(150, anhydrous, pentahydrate)).toBeCloseTo(235.45, 1);
    expect(
      convertForm(convertForm(42, anhydrous, pentahydrate), pentahydrate, anhydrous),
    ).toBeCloseTo(42, 10);
  });
});

describe('silver-to-chloride ratio', () => {
  // NaCl + AgNO₃ → AgCl + NaNO₃: one silver per chloride. A 12 % sensitiser over a 2 %
  // salt (both common practice) gives (120 / 169.87) / (20 / 58.44) = 2.06.
  it('is about 2 for a 12 % sensitiser over a 2 % salting solution', () => {
    const ratio = silverToChlorideRatio(
      { chemical: chemical('sodium chloride'), percent: 2 },
      { chemical: chemical('silver nitrate'), percent: 12 },
    );
    expect(ratio).toBeCloseTo(2.064, 2);
  });

  it('is 1 when the moles match, and null for a pair that is not chloride and silver', () => {
    const salt = chemical('sodium chloride');
    const silver = chemical('silver nitrate');
    // Equal moles per litre: percent proportional to molar mass.
    const ratio = silverToChlorideRatio(
      { chemical: salt, percent: 5.844 },
      { chemical: silver, percent: 16.987 },
    );
    expect(ratio).toBeCloseTo(1, 3);
    expect(
      silverToChlorideRatio({ chemical: silver, percent: 2 }, { chemical: salt, percent: 12 }),
    ).toBeNull();
  });
});
