import { createReadStream } from 'node:fs';
import { pipeline } from 'node:stream';
import { open } from 'node:fs/promises';
import iconv from 'iconv-lite';
import Papa from 'papaparse';

export type CsvEncoding = 'utf-8' | 'utf-16le' | 'utf-16be' | 'windows-1252';

/**
 * The file's encoding: a byte-order mark if there is one; else UTF-8 if every byte
 * sequence is valid UTF-8; else Windows-1252, what spreadsheet programs on Windows write
 * as "CSV". Streams the file, so memory stays flat.
 */
export async function detectEncoding(path: string): Promise<CsvEncoding> {
  const handle = await open(path, 'r');
  const head = Buffer.alloc(3);
  await handle.read(head, 0, 3, 0);
  await handle.close();
  if (head[0] === 0xef && head[1] === 0xbb && head[2] === 0xbf) return 'utf-8';
  if (head[0] === 0xff && head[1] === 0xfe) return 'utf-16le';
  if (head[0] === 0xfe && head[1] === 0xff) return 'utf-16be';
  const decoder = new TextDecoder('utf-8', { fatal: true });
  try {
    for await (const chunk of createReadStream(path))
      decoder.decode(chunk as Buffer, { stream: true });
    decoder.decode();
    return 'utf-8';
  } catch {
    return 'windows-1252';
  }
}

/** Papaparse's per-chunk parser (untyped in @types/papaparse): guesses delimiter and line ends once. */
interface ChunkParser {
  parse(
    input: string,
    baseIndex: number,
    ignoreLastRow: boolean,
  ): { data: string[][]; meta: { cursor: number } };
}
const { ParserHandle } = Papa as unknown as {
  ParserHandle: new (config: Papa.ParseConfig) => ChunkParser;
};

/**
 * The file's records as arrays of cells, decoded and without a BOM; skips blank lines.
 * Each decoded chunk is parsed once, its unfinished last record carried into the next, as
 * papaparse's own streamers do. (Its Node stream mode re-splits the rest of the chunk every
 * time the reader pauses it, every 16 records: gigabytes of garbage for a 50,000-row file.)
 */
export async function* readRecords(path: string, encoding: CsvEncoding): AsyncGenerator<string[]> {
  // Line ends are made one kind before parsing: papaparse guesses them once, from the
  // start, and a file with rows added by another program (CRLF and LF mixed) would run
  // two rows into one. Line breaks inside quoted cells become LF too, as a form stores them.
  const parser = new ParserHandle({ skipEmptyLines: 'greedy', newline: '\n' });
  const decoded = pipeline(
    createReadStream(path),
    iconv.decodeStream(encoding, { stripBOM: true }),
    () => undefined,
  );
  let rest = '';
  let base = 0;
  // A CR at a chunk's end may be half of a CRLF: it waits for the next chunk.
  let carried = '';
  for await (const chunk of decoded as AsyncIterable<string>) {
    let text = carried + chunk;
    carried = text.endsWith('\r') ? '\r' : '';
    if (carried) text = text.slice(0, -1);
    const input = rest + oneLineEnd(text);
    const { data, meta } = parser.parse(input, base, true);
    rest = input.substring(meta.cursor - base);
    base = meta.cursor;
    yield* data;
  }
  rest += oneLineEnd(carried);
  if (rest) yield* parser.parse(rest, base, false).data;
}

/** CRLF and a lone CR (old Mac files) as LF. */
const oneLineEnd = (text: string) => text.replace(/\r\n?/g, '\n');

/** The header record (trimmed cells), or null for an empty file. */
export async function readHeaders(path: string, encoding: CsvEncoding): Promise<string[] | null> {
  const records = readRecords(path, encoding);
  const first = await records.next();
  await records.return(undefined);
  return first.done ? null : first.value.map((cell) => cell.trim());
}
