import {
  closeSync,
  existsSync,
  ftruncateSync,
  openSync,
  readFileSync,
  renameSync,
  writeSync,
} from 'node:fs';
import { Columns, type NumericColumns } from './columns';
import { SearchEngine } from './engine';
import { Postings } from './postings';
import { Vocabulary } from './vocabulary';

/** Bump when the layout or the way words are made changes: older snapshots are ignored. */
const FORMAT = 4;

interface ArrayEntry {
  name: string;
  offset: number;
  bytes: number;
}

interface Header {
  format: number;
  fingerprint: string;
  size: number;
  words: string[];
  accessionNumber: string[];
  title: string[];
  arrays: ArrayEntry[];
}

type Typed = Int32Array | Uint8Array | Float32Array | Uint32Array;

/**
 * Writes the engine to one file: a JSON header (words, accession numbers, titles) and the
 * typed arrays as raw bytes, so loading is a read and a few copies instead of a rebuild.
 * Written beside and renamed, so a crash never leaves half a snapshot.
 */
export function writeSnapshot(engine: SearchEngine, fingerprint: string, file: string): void {
  engine.compact();
  const typed: Array<[string, Typed]> = [
    ['open.offsets', engine.open.offsets],
    ['open.slots', engine.open.slots],
    ['open.weights', engine.open.weights],
    ['place.offsets', engine.place.offsets],
    ['place.slots', engine.place.slots],
    ['place.weights', engine.place.weights],
    ['restricted.offsets', engine.restricted.offsets],
    ['restricted.slots', engine.restricted.slots],
    ['restricted.weights', engine.restricted.weights],
    ...Columns.names.map(
      (name) =>
        [`columns.${name}`, engine.columns.numeric[name].subarray(0, engine.columns.size)] as [
          string,
          Typed,
        ],
    ),
  ];
  const arrays: ArrayEntry[] = [];
  let offset = 0;
  for (const [name, array] of typed) {
    arrays.push({ name, offset, bytes: array.byteLength });
    offset += Math.ceil(array.byteLength / 8) * 8;
  }
  const size = engine.columns.size;
  const header: Header = {
    format: FORMAT,
    fingerprint,
    size,
    words: engine.vocabulary.words,
    accessionNumber: engine.columns.accessionNumber.slice(0, size),
    title: engine.columns.title.slice(0, size),
    arrays,
  };
  const headerBytes = Buffer.from(JSON.stringify(header));
  const length = Buffer.alloc(4);
  length.writeUInt32LE(headerBytes.length);
  // Piece by piece from the arrays themselves: no 67 MB copy of the body at 100,000 prints.
  const fd = openSync(`${file}.tmp`, 'w');
  try {
    writeSync(fd, length);
    writeSync(fd, headerBytes);
    const bodyStart = 4 + headerBytes.length;
    for (const [index, [, array]] of typed.entries())
      writeSync(
        fd,
        new Uint8Array(array.buffer, array.byteOffset, array.byteLength),
        0,
        array.byteLength,
        bodyStart + arrays[index]!.offset,
      );
    // The last array's padding, so the file is as long as the layout says.
    ftruncateSync(fd, bodyStart + offset);
  } finally {
    closeSync(fd);
  }
  renameSync(`${file}.tmp`, file);
}

/** The engine and the fingerprint it was saved with; null when absent, old or unreadable. */
export function readSnapshot(file: string): { engine: SearchEngine; fingerprint: string } | null {
  if (!existsSync(file)) return null;
  try {
    const data = readFileSync(file);
    const headerLength = data.readUInt32LE(0);
    const header = JSON.parse(data.subarray(4, 4 + headerLength).toString()) as Header;
    if (header.format !== FORMAT) return null;
    const bodyStart = 4 + headerLength;
    const bytes = (name: string) => {
      const entry = header.arrays.find((array) => array.name === name)!;
      // A copy: the file buffer is not 4-byte aligned for the typed-array views.
      const start = bodyStart + entry.offset;
      return new Uint8Array(data.subarray(start, start + entry.bytes)).buffer;
    };
    const engine = new SearchEngine();
    engine.vocabulary = Vocabulary.fromWords(header.words);
    for (const kind of ['open', 'place', 'restricted'] as const) {
      const postings = new Postings();
      postings.offsets = new Int32Array(bytes(`${kind}.offsets`));
      postings.slots = new Int32Array(bytes(`${kind}.slots`));
      postings.weights = new Float32Array(bytes(`${kind}.weights`));
      engine[kind] = postings;
    }
    const numeric = Object.fromEntries(
      Columns.names.map((name) => [name, new Columns.types[name](bytes(`columns.${name}`))]),
    ) as unknown as NumericColumns;
    engine.columns = Columns.fromArrays(header.size, numeric, header.accessionNumber, header.title);
    for (let slot = 0; slot < header.size; slot += 1)
      if (numeric.live[slot] === 1) engine.slotOf.set(numeric.printId[slot]!, slot);
    return { engine, fingerprint: header.fingerprint };
  } catch {
    return null;
  }
}
