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

/** Words already normalised: a build meets the same few thousand words 100,000 times over. */
const normalised = new Map<string, string>();
/** Past this many remembered words the memory starts again (unbounded text, bounded map). */
const REMEMBERED_WORDS = 50_000;

/** Lower case, accents dropped, one spelling per word. */
export function normalizeWord(word: string): string {
  const known = normalised.get(word);
  if (known !== undefined) return known;
  const lower = word.toLowerCase();
  // Accents need the slow Unicode decomposition; plain ASCII words (most) skip it.
  // eslint-disable-next-line no-control-regex
  const plain = /^[\x00-\x7f]*$/.test(lower)
    ? lower
    : lower.normalize('NFKD').replace(/\p{M}/gu, '');
  // Own keys only: "constructor" or "toString" must not find Object.prototype's.
  const result = Object.hasOwn(SPELLING_VARIANTS, plain) ? SPELLING_VARIANTS[plain]! : plain;
  if (normalised.size >= REMEMBERED_WORDS) normalised.clear();
  normalised.set(word, result);
  return result;
}

const LETTER_OR_DIGIT = /[\p{L}\p{N}]/u;

/** 0–9, a–z, A–Z, or any letter or digit beyond ASCII. */
function isWordChar(code: number, text: string, at: number): boolean {
  if (code < 128)
    return (code >= 48 && code <= 57) || (code >= 97 && code <= 122) || (code >= 65 && code <= 90);
  return LETTER_OR_DIGIT.test(text[at]!);
}

const isDigit = (code: number) => code >= 48 && code <= 57;
/** `.`, `-` and `/` join a word to the digits after them: "2024.0012", "FIX-24B". */
const isJoiner = (code: number) => code === 46 || code === 45 || code === 47;

/**
 * Calls `visit` with each word of the text as written (not yet normalised): runs of
 * letters and digits; a dot, dash or slash followed by a digit stays inside the word, so
 * accession numbers ("2024.0012") and batch codes ("FIX-24B") stay whole. "15%" gives
 * "15"; "sodium-thiosulfate" gives both parts. A hand-written scanner: a build tokenises
 * 100,000 prints, and a regex was the slow part.
 */
export function scanWords(text: string, visit: (raw: string) => void): void {
  const length = text.length;
  let start = -1;
  for (let i = 0; i <= length; i += 1) {
    const code = i < length ? text.charCodeAt(i) : 32;
    if (isWordChar(code, text, i)) {
      if (start < 0) start = i;
      continue;
    }
    if (start >= 0 && isJoiner(code) && i + 1 < length && isDigit(text.charCodeAt(i + 1))) continue;
    if (start >= 0) {
      visit(text.slice(start, i));
      start = -1;
    }
  }
}

/** The text's search words, normalised (`normalizeWord`), in order. */
export function searchWords(text: string): string[] {
  const words: string[] = [];
  scanWords(text, (raw) => {
    const word = normalizeWord(raw);
    if (word) words.push(word);
  });
  return words;
}
