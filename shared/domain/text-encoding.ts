/** The encodings a person can choose for a CSV import; `auto` lets the server sniff. */
export const IMPORT_ENCODINGS = ['auto', 'utf-8', 'windows-1252'] as const;
export type ImportEncoding = (typeof IMPORT_ENCODINGS)[number];

export const IMPORT_ENCODING_LABELS: Record<ImportEncoding, string> = {
  auto: 'Detect',
  'utf-8': 'UTF-8',
  'windows-1252': 'Windows-1252 (Western European)',
};

/** U+FFFD: what a decoder puts where bytes are not valid in the encoding it was told. */
const REPLACEMENT = '\uFFFD';

/**
 * UTF-8 read as Windows-1252: a lead byte (Â–ô, 0xC2–0xF4) followed by what a continuation
 * byte (0x80–0xBF) becomes in Windows-1252 — "Ã©" for "é", "â€™" for "’". Words in Western
 * European languages almost never pair these, so the pair is a sign of a misread file.
 */
const MISREAD_UTF8 =
  /[\u00C2-\u00F4][\u0080-\u00BF\u0152\u0153\u0160\u0161\u0178\u017D\u017E\u0192\u02C6\u02DC\u2013\u2014\u2018-\u201A\u201C-\u201E\u2020-\u2022\u2026\u2030\u2039\u203A\u20AC\u2122]/;

/** True when decoded text shows signs of having been read in the wrong encoding. */
export function looksMisread(text: string): boolean {
  return text.includes(REPLACEMENT) || MISREAD_UTF8.test(text);
}

/** The message for a row whose text was read in the wrong encoding. */
export const MISREAD_MESSAGE =
  'Some characters were not read correctly (the file seems to mix UTF-8 and Windows-1252 text). Choose the file’s encoding and check again, or fix these cells.';
