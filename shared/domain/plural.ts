import { formatCount, nounFor } from './format';

/** The English plural of a noun, for the plural category of `count` (CLDR rules). */
export function pluralOf(noun: string, count: number): string {
  return nounFor(count, noun);
}

/** "1 check", "2 checks", "1,000 patches": the same as `formatCount` (one implementation). */
export function countOf(count: number, noun: string): string {
  return formatCount(count, noun);
}
