import { describe, expect, it } from 'vitest';
import { parseRange } from '../../../../server/services/storage/byte-range';

// Examples from RFC 9110 §14.1.2 for a 10,000-byte representation.
describe('parseRange (RFC 9110 §14.1.2)', () => {
  it('reads first-last, open-ended and suffix ranges', () => {
    expect(parseRange('bytes=0-499', 10000)).toEqual({ start: 0, end: 499 });
    expect(parseRange('bytes=9500-', 10000)).toEqual({ start: 9500, end: 9999 });
    expect(parseRange('bytes=-500', 10000)).toEqual({ start: 9500, end: 9999 });
    expect(parseRange('bytes=500-99999', 10000)).toEqual({ start: 500, end: 9999 });
  });

  it('answers the whole file for no header, several ranges or nonsense', () => {
    expect(parseRange(undefined, 10000)).toBeNull();
    expect(parseRange('bytes=0-1,5-6', 10000)).toBeNull();
    expect(parseRange('items=0-1', 10000)).toBeNull();
  });

  it('refuses a range that starts past the end', () => {
    expect(parseRange('bytes=10000-', 10000)).toBe('unsatisfiable');
    expect(parseRange('bytes=-0', 10000)).toBe('unsatisfiable');
  });
});
