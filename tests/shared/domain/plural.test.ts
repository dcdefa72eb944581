import { describe, expect, it } from 'vitest';
import { formatCount } from '../../../shared/domain/format';
import { countOf, pluralOf } from '../../../shared/domain/plural';

// CLDR plural rules for English: "one" is exactly 1 (integer, no visible decimals); 0 and
// every other count take "other" (unicode.org CLDR language plural rules chart).
describe('countOf', () => {
  it('says "1 check" and "0 checks", "2 rows", "1 row"', () => {
    expect(countOf(1, 'check')).toBe('1 check');
    expect(countOf(0, 'check')).toBe('0 checks');
    expect(countOf(2, 'row')).toBe('2 rows');
    expect(countOf(1, 'row')).toBe('1 row');
  });

  it('knows the -es plurals the tone area uses', () => {
    expect(pluralOf('patch', 3)).toBe('patches');
    expect(pluralOf('patch', 1)).toBe('patch');
  });

  it('groups the digits of large counts the same way formatCount does', () => {
    expect(countOf(1000, 'check')).toBe('1,000 checks');
    expect(countOf(100000, 'patch')).toBe(formatCount(100000, 'patch'));
  });
});
