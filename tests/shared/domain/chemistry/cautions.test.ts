import { describe, expect, it } from 'vitest';
import { solutionCautions } from '../../../../shared/domain/chemistry/cautions';
import { KNOWN_CHEMICALS } from '../../../../shared/domain/chemistry/chemicals';

// The hazards are the usual safety-data-sheet headlines (from memory); design §8 asks for
// them wherever a solution is worked out, with the data sheet and local rules first.
describe('solution cautions', () => {
  it.each(KNOWN_CHEMICALS.map((chemical) => chemical.name))(
    'gives %s its own caution, the general ones and the plain statement',
    (name) => {
      const cautions = solutionCautions([name]);
      expect(cautions.length).toBeGreaterThanOrEqual(4);
      expect(cautions[cautions.length - 1]).toMatch(
        /does not replace.*safety data sheet.*local regulations.*licensed practice/,
      );
      expect(cautions.join(' ')).toMatch(/gloves and eye protection/i);
      expect(cautions.join(' ')).toMatch(/used fixer out of drains/);
    },
  );

  it('names silver nitrate as corrosive, damaging to eyes, staining, an oxidiser and toxic to aquatic life', () => {
    const [silver] = solutionCautions(['silver nitrate']);
    expect(silver).toMatch(/corrosive.*eye damage.*stains skin.*oxidiser.*aquatic life/);
  });
});
