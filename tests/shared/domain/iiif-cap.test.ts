import { describe, expect, it } from 'vitest';
import { allowedScaleFactors, iiifSizeCap } from '../../../shared/domain/iiif-cap';

describe('IIIF size cap (contract: viewers see at most the 2048 px web size)', () => {
  it('scales the long side to the cap and keeps the aspect', () => {
    expect(iiifSizeCap(6600, 4400, 2048)).toEqual({ maxWidth: 2048, maxHeight: 1365 });
    expect(iiifSizeCap(4400, 6600, 2048)).toEqual({ maxWidth: 1365, maxHeight: 2048 });
  });

  it('leaves images under the cap, and callers without a cap, at full size', () => {
    expect(iiifSizeCap(1200, 900, 2048)).toEqual({ maxWidth: 1200, maxHeight: 900 });
    expect(iiifSizeCap(6600, 4400, null)).toEqual({ maxWidth: 6600, maxHeight: 4400 });
  });

  it('keeps only scale factors whose whole image fits', () => {
    const cap = iiifSizeCap(6600, 4400, 2048);
    expect(allowedScaleFactors([1, 2, 4, 8, 16], 6600, 4400, cap)).toEqual([4, 8, 16]);
    expect(allowedScaleFactors([1, 2, 4], 1200, 900, iiifSizeCap(1200, 900, 2048))).toEqual([
      1, 2, 4,
    ]);
  });
});
