import { describe, expect, it } from 'vitest';
import { formatSize, inchesToMm, mmToInches } from '../../../shared/domain/units';

describe('lengths', () => {
  // NIST SP 811 (2008), appendix B.8: 1 inch = 2.54 × 10⁻² m exactly.
  it('converts with the exact international inch', () => {
    expect(inchesToMm(1)).toBe(25.4);
    expect(mmToInches(254)).toBeCloseTo(10, 12);
  });

  // A 4 × 5 in sheet film contact print is 101.6 × 127 mm (4 × 25.4, 5 × 25.4; NIST SP 811).
  it('shows a 4 × 5 inch print in both units', () => {
    expect(formatSize(101.6, 127, 'mm')).toBe('101.6 × 127 mm');
    expect(formatSize(101.6, 127, 'in')).toBe('4 × 5 in');
  });

  it('shows nothing when a side is unknown', () => {
    expect(formatSize(null, 127, 'mm')).toBeNull();
  });
});
