import { describe, expect, it } from 'vitest';
import { bathCapacity, sheetsThroughBath } from '../../../../shared/domain/chemistry/fixer-usage';
import {
  defaultChemistrySettings,
  CHEMISTRY_SETTINGS,
} from '../../../../shared/domain/chemistry/settings';
import {
  eightByTenEquivalents,
  sensitiserNeededMl,
} from '../../../../shared/domain/chemistry/sheets';
import {
  fromGrams,
  fromMillilitres,
  sheetAreaCm2,
  toMillilitres,
} from '../../../../shared/domain/chemistry/units';

describe('US units', () => {
  // NIST Handbook 44, Appendix C: 1 US fl oz = 29.573 53 ml; 1 oz avdp = 28.349 523 125 g;
  // 1 grain = 64.798 91 mg.
  it('converts fluid ounces, ounces and grains as NIST defines them', () => {
    expect(toMillilitres(1, 'fl oz')).toBeCloseTo(29.57353, 5);
    expect(fromMillilitres(946.352946, 'fl oz')).toBeCloseTo(32, 5); // a US quart
    expect(fromGrams(28.349523125, 'oz')).toBeCloseTo(1, 10);
    expect(fromGrams(12, 'gr')).toBeCloseTo(185.19, 2);
  });
});

describe('sheets', () => {
  it('counts four 4×5 in pieces as one 8×10 in sheet (common practice: an 8×10 cuts into four)', () => {
    const quarter = sheetAreaCm2(4, 5, 'in');
    expect(4 * quarter).toBeCloseTo(sheetAreaCm2(8, 10, 'in'), 10);
    expect(eightByTenEquivalents(101.6, 127)).toBeCloseTo(0.25, 10);
    expect(eightByTenEquivalents(null, 127)).toBe(1);
  });

  it('needs the same sensitiser for four 4×5 pieces as for one 8×10 sheet', () => {
    const mlPer8x10 = defaultChemistrySettings().sensitiserMlPer8x10;
    const one = sensitiserNeededMl({
      sheets: 1,
      areaCm2: sheetAreaCm2(8, 10, 'in'),
      coats: 1,
      mlPer8x10,
    });
    const four = sensitiserNeededMl({
      sheets: 4,
      areaCm2: sheetAreaCm2(4, 5, 'in'),
      coats: 1,
      mlPer8x10,
    });
    expect(one).toBeCloseTo(mlPer8x10, 10);
    expect(four).toBeCloseTo(one, 10);
    expect(
      sensitiserNeededMl({ sheets: 10, areaCm2: sheetAreaCm2(8, 10, 'in'), coats: 2, mlPer8x10 }),
    ).toBeCloseTo(20 * mlPer8x10, 10);
  });
});

describe('fixer use', () => {
  it('gives each default a source', () => {
    for (const setting of Object.values(CHEMISTRY_SETTINGS)) {
      expect(setting.source).toMatch(/common practice/i);
    }
  });

  // Common practice (The Darkroom Cookbook): about 20 8×10 in sheets per litre when the
  // capacity is not known, so a 2 litre bath fixes about 40.
  it('fixes 40 sheets in a 2 litre bath at 20 per litre, and knows nothing without a volume', () => {
    expect(bathCapacity(2000, 20)).toBe(40);
    expect(bathCapacity(null, 20)).toBeNull();
  });

  it('counts sheets through a bath in the order the prints were made, undated last', () => {
    const through = sheetsThroughBath([
      { printId: 3, madeFrom: null, sheetWidthMm: null, sheetHeightMm: null },
      { printId: 1, madeFrom: '2024-05-01', sheetWidthMm: 203.2, sheetHeightMm: 254 },
      { printId: 2, madeFrom: '2024-04-01', sheetWidthMm: 101.6, sheetHeightMm: 127 },
    ]);
    expect(through.get(2)).toBeCloseTo(0.25, 10);
    expect(through.get(1)).toBeCloseTo(1.25, 10);
    expect(through.get(3)).toBeCloseTo(2.25, 10);
  });
});
