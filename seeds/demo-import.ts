import { writeFileSync } from 'node:fs';
import { stringify } from 'csv-stringify/sync';
import { seededRandom } from './random';

/**
 * The demo spreadsheet an archive might bring: 500 prints from an older card catalogue,
 * invented, with three bad rows (an unknown process, fixing minutes in words, a missing
 * title) to fix and import again. `npx tsx seeds/demo-import.ts` rewrites
 * seeds/demo-import.csv; the same seed gives the same file.
 */
export const DEMO_IMPORT_FILE = 'seeds/demo-import.csv';
export const DEMO_IMPORT_ROWS = 500;
/** Data rows (1 = first row after the header) that are wrong on purpose. */
export const DEMO_IMPORT_BAD_ROWS = [87, 243, 411];

const HEADERS = [
  'Accession no.',
  'Title',
  'Maker',
  'Date made',
  'Process',
  'Paper',
  'Fixing (min)',
  'Washing (min)',
  'Tags',
  'Description',
];
const PLACES = [
  'Elder Brook',
  'Mill Lane',
  'the weir',
  'Hollin Wood',
  'Sallow Moor',
  'the old tannery',
  'Crake Bridge',
  'the allotments',
];
const SUBJECTS = [
  'morning',
  'frost',
  'high water',
  'the gate',
  'reeds',
  'washing day',
  'the kiln',
  'late light',
  'sheep wash',
  'hawthorn',
];
const MAKERS = [
  'Mill Lane darkroom',
  'E. Thornbury',
  'J. Pellow',
  'Sallow Moor camera club',
  'R. Okafor-Hale',
];
const PAPERS = [
  'Hot-pressed cotton rag 300',
  'Cold-pressed cotton rag 250',
  'Gelatin-sized writing paper 120',
  'Kozo tissue 45',
];
const TAGS = ['river', 'winter', 'mill', 'village', 'trees', 'field', 'portrait', 'water'];

function rows(): string[][] {
  const rng = seededRandom(19990);
  return Array.from({ length: DEMO_IMPORT_ROWS }, (_, index) => {
    const n = index + 1;
    const year = rng.int(1998, 2019);
    const subject = rng.pick(SUBJECTS);
    const cells = [
      `2019.${String(5000 + n)}`,
      `${subject[0]!.toUpperCase()}${subject.slice(1)} at ${rng.pick(PLACES)}`,
      rng.pick(MAKERS),
      rng.chance(0.2) ? `c. ${year}` : String(year),
      rng.chance(0.85) ? 'salt print' : 'cyanotype',
      rng.pick(PAPERS),
      String(rng.int(4, 15)),
      String(rng.int(5, 40)),
      `${rng.pick(TAGS)}; ${rng.pick(TAGS)}`,
      rng.chance(0.1) ? 'From the card catalogue,\nsecond drawer.' : '',
    ];
    if (n === 87) cells[4] = 'daguerreotype';
    if (n === 243) cells[6] = 'ten';
    if (n === 411) cells[1] = '';
    return cells;
  });
}

/** The demo spreadsheet as CSV text (CRLF, as spreadsheets write it). */
export function demoImportCsv(): string {
  return stringify([HEADERS, ...rows()], { record_delimiter: 'windows' });
}

if (process.argv[1]?.endsWith('demo-import.ts')) {
  writeFileSync(DEMO_IMPORT_FILE, demoImportCsv());
  console.log(`Wrote ${DEMO_IMPORT_FILE}`);
}
