import type {
  LocationInput,
  NegativeInput,
  PaperInput,
  SolutionBatchInput,
} from '../shared/schemas/reference';

/**
 * The invented scenario: the Elderbrook Valley Archive, a small regional collection, and
 * the Mill Lane community darkroom whose members print for it. Every name is made up.
 */
export const ARCHIVE_NAME = 'Elderbrook Valley Archive';

export const DEMO_PASSWORD = 'printwarden-demo';
export const DEMO_USERS = [
  { email: 'admin@printwarden.test', name: 'Ada Brackwell', role: 'admin' },
  { email: 'archivist@printwarden.test', name: 'Ines Wetherall', role: 'archivist' },
  { email: 'curator@printwarden.test', name: 'Tomas Ruddle', role: 'curator' },
  { email: 'conservator@printwarden.test', name: 'Ruth Okonedo-Penn', role: 'conservator' },
  { email: 'viewer@printwarden.test', name: 'Milo Sarrant', role: 'viewer' },
] as const;

export const DEMO_PAPERS: PaperInput[] = [
  {
    name: 'Hot-pressed cotton rag 300',
    fibre: 'cotton rag',
    weightGsm: 300,
    surface: 'smooth',
    sizing: 'internal and gelatin surface sizing',
    notes: 'The darkroom’s everyday salt-print paper.',
  },
  {
    name: 'Cold-pressed cotton rag 250',
    fibre: 'cotton rag',
    weightGsm: 250,
    surface: 'textured',
    sizing: 'internal sizing only',
  },
  {
    name: 'Gelatin-sized writing paper 120',
    fibre: 'cotton and linen',
    weightGsm: 120,
    surface: 'smooth',
    sizing: 'gelatin bath, hand-sized',
  },
  {
    name: 'Kozo tissue 45',
    fibre: 'kozo',
    weightGsm: 45,
    surface: 'soft',
    sizing: 'arrowroot sized in the darkroom',
  },
  {
    name: 'Albumenised sheet 90',
    fibre: 'cotton',
    weightGsm: 90,
    surface: 'glossy albumen',
    sizing: 'albumen and salt coating',
  },
];

export const DEMO_NEGATIVES: NegativeInput[] = [
  {
    code: 'GP-001',
    kind: 'glass plate',
    format: 'half plate',
    subject: 'Weir and mill race',
    densityRange: 1.8,
  },
  {
    code: 'GP-002',
    kind: 'glass plate',
    format: 'whole plate',
    subject: 'Church lane in snow',
    densityRange: 1.9,
  },
  {
    code: 'GP-003',
    kind: 'glass plate',
    format: 'quarter plate',
    subject: 'Orchard gate',
    densityRange: 1.6,
  },
  {
    code: 'FN-014',
    kind: 'film',
    format: '4 × 5 in',
    subject: 'Mill pond at dusk',
    densityRange: 1.7,
  },
  { code: 'FN-015', kind: 'film', format: '5 × 7 in', subject: 'Flax field', densityRange: 2.0 },
  {
    code: 'FN-021',
    kind: 'film',
    format: '8 × 10 in',
    subject: 'Allotment sheds',
    densityRange: 1.9,
  },
  {
    code: 'DN-101',
    kind: 'digital negative',
    format: '8 × 10 in',
    subject: 'Market hall roof',
    densityRange: 2.1,
  },
  {
    code: 'DN-102',
    kind: 'digital negative',
    format: '8 × 10 in',
    subject: 'Dunstan footbridge',
    densityRange: 2.2,
  },
  {
    code: 'DN-103',
    kind: 'digital negative',
    format: 'A4',
    subject: 'Wool-store windows',
    densityRange: 2.0,
  },
  {
    code: 'PN-007',
    kind: 'paper negative',
    format: '5 × 7 in',
    subject: 'Willow pollards',
    densityRange: 1.5,
  },
];

/** Places in parent-first order; `parent` is the code of the place above. */
export const DEMO_LOCATIONS: Array<LocationInput & { parent?: string }> = [
  { code: 'SR', name: 'Store room' },
  { code: 'SR-C1', name: 'Cabinet 1', parent: 'SR' },
  { code: 'SR-C1-D1', name: 'Drawer 1', parent: 'SR-C1' },
  { code: 'SR-C1-D2', name: 'Drawer 2', parent: 'SR-C1' },
  { code: 'SR-C1-D3', name: 'Drawer 3', parent: 'SR-C1' },
  { code: 'SR-C2', name: 'Cabinet 2', parent: 'SR' },
  { code: 'SR-C2-B1', name: 'Solander box 1', parent: 'SR-C2' },
  { code: 'SR-C2-B2', name: 'Solander box 2', parent: 'SR-C2' },
  { code: 'RR', name: 'Reading room' },
  { code: 'RR-W', name: 'Display wall', parent: 'RR' },
  { code: 'LS', name: 'Loans shelf' },
];

export const DEMO_BATCHES: SolutionBatchInput[] = [
  {
    code: 'SALT-24A',
    kind: 'salting',
    chemical: 'sodium chloride',
    concentrationPercent: 2,
    volumeMl: 1000,
    madeOn: '2024-02-03',
    madeBy: 'Mill Lane darkroom',
  },
  {
    code: 'SENS-24A',
    kind: 'sensitiser',
    chemical: 'silver nitrate',
    concentrationPercent: 12,
    volumeMl: 100,
    madeOn: '2024-02-03',
    madeBy: 'Mill Lane darkroom',
  },
  {
    code: 'FIX-24A',
    kind: 'fixer',
    chemical: 'sodium thiosulfate',
    concentrationPercent: 15,
    volumeMl: 2000,
    madeOn: '2024-02-10',
    madeBy: 'Mill Lane darkroom',
    exhaustedOn: '2024-03-01',
  },
  {
    code: 'FIX-25A',
    kind: 'fixer',
    chemical: 'sodium thiosulfate',
    concentrationPercent: 10,
    volumeMl: 2000,
    madeOn: '2025-04-12',
    madeBy: 'Mill Lane darkroom',
  },
  {
    code: 'TONE-25A',
    kind: 'toner',
    chemical: 'gold chloride',
    concentrationPercent: 0.2,
    volumeMl: 500,
    madeOn: '2025-05-01',
    madeBy: 'Mill Lane darkroom',
  },
];
