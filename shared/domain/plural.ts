const RULES = new Intl.PluralRules('en');

/** Plural forms that are not the singular plus "s". */
const IRREGULAR: Record<string, string> = { patch: 'patches', batch: 'batches' };

/** The English plural of a noun, for the plural category of `count` (CLDR rules). */
export function pluralOf(noun: string, count: number): string {
  if (RULES.select(count) === 'one') return noun;
  return IRREGULAR[noun] ?? `${noun}s`;
}

/** "1 check", "2 checks", "0 patches": a count with its noun in the right number. */
export function countOf(count: number, noun: string): string {
  return `${count} ${pluralOf(noun, count)}`;
}
