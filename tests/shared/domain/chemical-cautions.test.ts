import { describe, expect, it } from 'vitest';
import { cautionsFor } from '../../../shared/domain/chemical-cautions';

// The hazards named here are the usual safety-data-sheet headlines (from memory); the
// test checks that each bath shows its own, not the wording.
describe('chemical cautions', () => {
  it('names each chemical of a salt print once', () => {
    const cautions = cautionsFor([
      'sodium chloride',
      'silver nitrate',
      'sodium thiosulfate',
      'silver nitrate',
    ]);
    expect(cautions.map((c) => c.chemical)).toEqual([
      'Silver nitrate',
      'Sodium thiosulfate',
      'Sodium chloride',
    ]);
    expect(cautions[0]!.caution).toMatch(/eye damage/);
  });

  it('warns about acids with ferricyanide for a cyanotype', () => {
    const [caution] = cautionsFor(['ferric ammonium citrate and potassium ferricyanide']);
    expect(caution!.chemical).toBe('Potassium ferricyanide');
    expect(cautionsFor(['ferric ammonium citrate and potassium ferricyanide'])).toHaveLength(2);
  });

  it('says nothing for plain water or no chemical', () => {
    expect(cautionsFor([null, 'water'])).toEqual([]);
  });
});
