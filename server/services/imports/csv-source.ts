import { createReadStream } from 'node:fs';
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

/** The file's records as arrays of cells, decoded and without a BOM; skips blank lines. */
export async function* readRecords(path: string, encoding: CsvEncoding): AsyncGenerator<string[]> {
  const parser = Papa.parse(Papa.NODE_STREAM_INPUT, { skipEmptyLines: 'greedy' });
  const decoded = createReadStream(path).pipe(iconv.decodeStream(encoding, { stripBOM: true }));
  decoded.on('error', (error) => parser.destroy(error));
  decoded.pipe(parser);
  for await (const record of parser) yield record as string[];
}

/** The header record (trimmed cells), or null for an empty file. */
export async function readHeaders(path: string, encoding: CsvEncoding): Promise<string[] | null> {
  const records = readRecords(path, encoding);
  const first = await records.next();
  await records.return(undefined);
  return first.done ? null : first.value.map((cell) => cell.trim());
}
