import { describe, expect, it } from 'vitest';
import { formatAccessionNumber, parseAccessionNumber } from '../../../shared/domain/accession';

// Our default pattern (design §3): year of accession, a dot, a running number of 4 digits.
describe('accession numbers', () => {
  it('pads the running number to four digits and reads it back', () => {
    expect(formatAccessionNumber(2026, 7)).toBe('2026.0007');
    expect(parseAccessionNumber('2026.0007')).toEqual({ year: 2026, sequence: 7 });
  });

  it('grows past 9999 rather than wrapping', () => {
    expect(formatAccessionNumber(2026, 10000)).toBe('2026.10000');
    expect(parseAccessionNumber('2026.10000')?.sequence).toBe(10000);
  });

  it('does not read numbers of other patterns', () => {
    expect(parseAccessionNumber('MLD-44')).toBeNull();
  });
});
