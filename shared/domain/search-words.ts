/**
 * How text becomes search words, shared by the index (server) and the highlighter (client),
 * so a highlighted word is exactly a word the index matched.
 */

/**
 * The trade's spellings that mean the same thing, mapped to one indexed form. British and
 * American spellings of the same word (common practice in English-language darkroom
 * manuals), and "hypo", the darkroom's old name for sodium thiosulfate (from memory; the
 * name survives in "hypo clearing agent").
 */
export const SPELLING_VARIANTS: Readonly<Record<string, string>> = {
  sensitising: 'sensitizing',
  sensitised: 'sensitized',
  sensitise: 'sensitize',
  sensitiser: 'sensitizer',
  sensitisers: 'sensitizers',
  colour: 'color',
  colours: 'colors',
  coloured: 'colored',
  fibre: 'fiber',
  fibres: 'fibers',
  thiosulphate: 'thiosulfate',
  hypo: 'thiosulfate',
  sulphite: 'sulfite',
  sulphate: 'sulfate',
  grey: 'gray',
  albumenised: 'albumenized',
  gelatine: 'gelatin',
  centre: 'center',
  metre: 'meter',
  metres: 'meters',
  millimetre: 'millimeter',
  millimetres: 'millimeters',
};

/** Lower case, accents dropped, one spelling per word. */
export function normalizeWord(word: string): string {
  const plain = word.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase();
  return SPELLING_VARIANTS[plain] ?? plain;
}

/**
 * Splits text into words: letters and digits; a dot or dash between digits stays inside
 * the word so accession numbers ("2024.0012") and batch codes ("FIX-24B") stay whole.
 * "15%" gives "15"; "sodium-thiosulfate" gives both parts.
 */
export function searchWords(text: string): string[] {
  const words: string[] = [];
  for (const match of text.matchAll(/[\p{L}\p{N}]+(?:[.\-/][\p{N}][\p{L}\p{N}]*)*/gu)) {
    const word = normalizeWord(match[0]);
    if (word) words.push(word);
  }
  return words;
}
