/** The catalogue fields a spreadsheet column can be mapped to, and how columns are matched to them. */

export const IMPORT_FIELDS = [
  'accessionNumber',
  'title',
  'process',
  'maker',
  'madeOn',
  'paper',
  'negative',
  'location',
  'imageWidthMm',
  'imageHeightMm',
  'sheetWidthMm',
  'sheetHeightMm',
  'edition',
  'status',
  'description',
  'tags',
  'fixingMinutes',
  'washingMinutes',
  'acquisitionMethod',
  'source',
  'acquiredOn',
  'acquisitionReference',
  'creditLine',
  'price',
  'provenance',
  'rightsStatement',
  'rightsHolder',
  'rightsNote',
  'inscriptions',
] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];

/** Without these a row cannot become a print; the accession number is the import's key. */
export const REQUIRED_IMPORT_FIELDS: readonly ImportField[] = [
  'accessionNumber',
  'title',
  'process',
];

export const IMPORT_FIELD_LABELS: Record<ImportField, string> = {
  accessionNumber: 'Accession number',
  title: 'Title',
  process: 'Process',
  maker: 'Maker',
  madeOn: 'Date made',
  paper: 'Paper (name)',
  negative: 'Negative (code)',
  location: 'Place (code)',
  imageWidthMm: 'Image width (mm)',
  imageHeightMm: 'Image height (mm)',
  sheetWidthMm: 'Sheet width (mm)',
  sheetHeightMm: 'Sheet height (mm)',
  edition: 'Edition',
  status: 'Status',
  description: 'Description',
  tags: 'Tags (separated by ;)',
  fixingMinutes: 'Fixing (minutes)',
  washingMinutes: 'Washing (minutes)',
  acquisitionMethod: 'How it came in (gift, purchase, …)',
  source: 'From whom (source name)',
  acquiredOn: 'Date it came in',
  acquisitionReference: 'Agreement reference',
  creditLine: 'Credit line',
  price: 'Price paid',
  provenance: 'Earlier owners (“Name (1931 to 1990s); …”)',
  rightsStatement: 'Rights statement (RightsStatements.org URI or label)',
  rightsHolder: 'Rights holder',
  rightsNote: 'Rights note',
  inscriptions: 'Marks (“verso, pencil inscription: text | …”)',
};

/** A problem names its field by label, as the column mapping does; other paths stay as they are. */
export function importFieldLabel(field: string): string {
  return (IMPORT_FIELDS as readonly string[]).includes(field)
    ? IMPORT_FIELD_LABELS[field as ImportField]
    : field;
}

/** Other spellings a spreadsheet may use for a field's column (lower case, letters and digits only). */
const ALIASES: Record<ImportField, string[]> = {
  accessionNumber: [
    'accessionnumber',
    'accession',
    'accessionno',
    'accno',
    'objectnumber',
    'inventorynumber',
  ],
  title: ['title', 'name'],
  process: ['process', 'technique'],
  maker: ['maker', 'photographer', 'printer', 'artist', 'creator'],
  madeOn: ['madeon', 'datemade', 'date', 'made'],
  paper: ['paper', 'papername'],
  negative: ['negative', 'negativecode'],
  location: ['location', 'place', 'placecode', 'locationcode'],
  imageWidthMm: ['imagewidthmm', 'imagewidth'],
  imageHeightMm: ['imageheightmm', 'imageheight'],
  sheetWidthMm: ['sheetwidthmm', 'sheetwidth'],
  sheetHeightMm: ['sheetheightmm', 'sheetheight'],
  edition: ['edition', 'impression'],
  status: ['status'],
  description: ['description', 'notes'],
  tags: ['tags', 'keywords'],
  fixingMinutes: ['fixingminutes', 'fixing', 'fixmin', 'fixingmin'],
  washingMinutes: ['washingminutes', 'washing', 'washmin', 'washingmin'],
  acquisitionMethod: ['acquisitionmethod', 'howacquired', 'method', 'acquisition'],
  source: ['source', 'donor', 'seller', 'from', 'acquiredfrom'],
  acquiredOn: ['acquiredon', 'dateacquired', 'acquisitiondate'],
  acquisitionReference: ['acquisitionreference', 'reference', 'agreement', 'agreementreference'],
  creditLine: ['creditline', 'credit'],
  price: ['price', 'pricepaid', 'cost'],
  provenance: ['provenance', 'earlierowners', 'owners'],
  rightsStatement: ['rightsstatement', 'rights', 'rightsstatus'],
  rightsHolder: ['rightsholder', 'copyrightholder'],
  rightsNote: ['rightsnote'],
  inscriptions: ['inscriptions', 'marks', 'marksandinscriptions'],
};

const normalise = (header: string) => header.toLowerCase().replace(/[^a-z0-9]/g, '');

/** A first guess at the mapping (column → field) from the column names alone. */
export function guessMapping(headers: readonly string[]): Record<string, ImportField> {
  const mapping: Record<string, ImportField> = {};
  const taken = new Set<ImportField>();
  for (const header of headers) {
    const key = normalise(header);
    const field = IMPORT_FIELDS.find(
      (candidate) => !taken.has(candidate) && ALIASES[candidate].includes(key),
    );
    if (field) {
      mapping[header] = field;
      taken.add(field);
    }
  }
  return mapping;
}

/** The column a failed-rows download adds; ignored when the file comes back. */
export const PROBLEMS_COLUMN = 'problems';

/** Identifies a spreadsheet layout by its columns, so its mapping can be offered again. */
export function layoutKey(headers: readonly string[]): string {
  return headers
    .filter((header) => header !== PROBLEMS_COLUMN)
    .map((header) => header.trim().toLowerCase())
    .sort()
    .join('\u001f');
}

/**
 * Whether a cell holds what a spreadsheet would run as a formula (OWASP, "CSV Injection"):
 * a leading `=` or `@`, or `+`/`-` not followed by a number.
 */
export function looksLikeFormula(cell: string): boolean {
  return /^[=@]/.test(cell) || /^[+-](?![\d.,]+$)/.test(cell.trim()) || /^[\t\r]/.test(cell);
}

/** A number as spreadsheets write it: "101.6", "101,6" (decimal comma), " 127 ". Null when empty; NaN when not a number. */
export function parseNumberCell(cell: string): number | null {
  const text = cell.trim();
  if (text === '') return null;
  const normalised = /^-?\d+,\d+$/.test(text) ? text.replace(',', '.') : text;
  return /^-?\d+(\.\d+)?$/.test(normalised) ? Number(normalised) : Number.NaN;
}
