import { describe, expect, it } from 'vitest';
import { ATOMIC_WEIGHTS_SOURCE } from '../../../../shared/domain/chemistry/atomic-weights';
import { findChemical, molarMass } from '../../../../shared/domain/chemistry/chemicals';

const massOf = (name: string) => molarMass(findChemical(name)!);

// Molar masses from the IUPAC 2007 standard atomic weights, checked against the values
// the issue states (they agree with PubChem's computed molecular weights, from memory).
describe('molar masses', () => {
  it('names the table it uses', () => {
    expect(ATOMIC_WEIGHTS_SOURCE).toMatch(/IUPAC.*2007/);
  });

  it.each([
    ['sodium chloride', 58.44],
    ['silver nitrate', 169.87],
    ['sodium thiosulfate', 158.11],
    ['sodium thiosulfate pentahydrate', 248.18],
  ])('%s is %s g/mol to two decimals', (name, expected) => {
    expect(massOf(name)).toBeCloseTo(expected, 2);
  });

  it('finds names regardless of case and spacing, and nothing it does not know', () => {
    expect(findChemical('  Silver   Nitrate ')?.formula).toBe('AgNO₃');
    expect(findChemical('mercuric chloride')).toBeNull();
  });
});
