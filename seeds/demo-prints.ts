import type { Process } from '../shared/domain/vocabulary';
import type { PrintCreateInput } from '../shared/schemas/print';
import type { ProcessingStepInput } from '../shared/schemas/processing-step';
import { parseApproximateDate } from '../shared/domain/approximate-date';
import { DEMO_BATCHES } from './demo-reference';
import { DEMO_TODAY } from './demo-tone';
import type { Random } from './random';

/** Ids of the reference records the prints link to, by code or name. */
export interface DemoLinks {
  papers: number[];
  albumenPaper: number;
  negatives: number[];
  places: number[];
  batches: Record<string, number>;
}

const SUBJECTS = [
  'Mill pond at dusk',
  'Weir below the footbridge',
  'Orchard gate in frost',
  'Flax field, late June',
  'Allotment sheds',
  'Wool-store windows',
  'Market hall roof',
  'Willow pollards by the leat',
  'Church lane in snow',
  'Sluice keeper’s cottage',
  'Drying racks, Mill Lane',
  'Hop poles at Carrow End',
  'Lock gates, low water',
  'Reeds on the east bank',
  'Quarry face after rain',
  'Ferry steps',
  'Bramble hedge',
  'Chapel yard yews',
  'Goods yard in fog',
  'Bean rows at evening',
];
const MAKERS = [
  'Wren Halloway',
  'Odile Marsh',
  'Piet Aldous',
  'Sunniva Crane',
  'Jory Fenn',
  'Mina Rook',
];
const TAGS = [
  'river',
  'mill',
  'winter',
  'landscape',
  'architecture',
  'botanical',
  'fog',
  'workshop',
  'village',
  'industry',
];
const SIZES: Array<[number, number, number, number]> = [
  [101.6, 127, 127, 178],
  [127, 178, 178, 240],
  [165, 216, 210, 297],
  [203.2, 254, 254, 330],
  [82.5, 108, 102, 152],
];

/** How the seed darkroom worked in a given year: its habits, good and bad. */
function saltSteps(rng: Random, links: DemoLinks, year: number): ProcessingStepInput[] {
  const rushed = rng.chance(0.18);
  const steps: ProcessingStepInput[] = [
    {
      stage: 'salting',
      chemical: 'sodium chloride',
      concentrationPercent: rng.pick([1.5, 2, 2.5]),
      method: 'floated',
      minutes: rng.int(2, 4),
      solutionBatchId: links.batches['SALT-24A'],
    },
    { stage: 'drying', method: 'air-dried', minutes: rng.int(30, 90) },
    {
      stage: 'sensitizing',
      chemical: 'silver nitrate',
      concentrationPercent: rng.pick([10, 12, 15]),
      method: rng.pick(['swabbed', 'brushed', 'rod-coated']),
      coats: rng.int(1, 2),
      solutionBatchId: links.batches['SENS-24A'],
    },
    { stage: 'drying', method: 'in the dark, air-dried', minutes: rng.int(20, 60) },
    exposure(rng),
  ];
  if (!rushed || rng.chance(0.5))
    steps.push({ stage: 'prewash', method: 'running water', minutes: rng.int(2, 5) });
  if (rng.chance(0.25))
    steps.push({
      stage: 'toning',
      chemical: 'gold chloride',
      concentrationPercent: 0.2,
      minutes: rng.int(3, 8),
      solutionBatchId: links.batches['TONE-25A'],
    });
  const fixBatch = year >= 2025 ? 'FIX-25A' : 'FIX-24A';
  steps.push({
    stage: 'fixing',
    chemical: 'sodium thiosulfate',
    concentrationPercent: rng.pick([10, 15]),
    method: 'tray, agitated',
    minutes: rushed ? rng.int(3, 8) : rng.int(10, 16),
    temperatureC: rng.int(18, 22),
    solutionBatchId: links.batches[fixBatch],
  });
  steps.push({
    stage: 'washing',
    method: 'running water',
    minutes: rushed ? rng.pick([3, 4, 6, 8]) : rng.int(12, 40),
    temperatureC: rng.int(14, 20),
  });
  steps.push({
    stage: 'drying',
    method: rng.pick(['between blotters', 'air-dried']),
    minutes: rng.int(120, 720),
  });
  return steps;
}

function exposure(rng: Random): ProcessingStepInput {
  const light = rng.pick(['open shade', 'direct sun', 'UV unit'] as const);
  const minutes =
    light === 'open shade'
      ? rng.int(25, 70)
      : light === 'direct sun'
        ? rng.int(6, 15)
        : rng.int(10, 25);
  return { stage: 'exposure', lightSource: light, method: 'contact frame', minutes };
}

function otherSteps(rng: Random, process: Process): ProcessingStepInput[] {
  if (process === 'cyanotype') {
    return [
      {
        stage: 'sensitizing',
        chemical: 'ferric ammonium citrate and potassium ferricyanide',
        method: 'brushed',
        coats: 1,
      },
      { stage: 'drying', method: 'in the dark, air-dried', minutes: rng.int(30, 60) },
      exposure(rng),
      { stage: 'washing', method: 'running water', minutes: rng.pick([4, 10, 15, 20]) },
      { stage: 'drying', method: 'air-dried', minutes: 240 },
    ];
  }
  if (process === 'platinum/palladium print') {
    return [
      {
        stage: 'sensitizing',
        chemical: 'ferric oxalate, palladium and platinum salts',
        method: 'rod-coated',
        coats: 1,
      },
      { stage: 'drying', method: 'warm air', minutes: rng.int(10, 20) },
      {
        stage: 'exposure',
        lightSource: 'UV unit',
        method: 'contact frame',
        minutes: rng.int(8, 14),
      },
      { stage: 'other', chemical: 'potassium oxalate', method: 'developer poured', minutes: 2 },
      {
        stage: 'clearing',
        chemical: 'EDTA',
        concentrationPercent: 2,
        method: 'three baths',
        minutes: 15,
      },
      { stage: 'washing', method: 'running water', minutes: rng.int(15, 30) },
      { stage: 'drying', method: 'between blotters', minutes: 480 },
    ];
  }
  // Albumen: like a salt print on albumenised paper.
  return [];
}

const MIXED_ON = new Map(DEMO_BATCHES.map((batch) => [batch.code, batch.madeOn]));

/**
 * The darkroom's batch records begin in 2024: a step names a batch only when the batch had
 * been mixed by the time the print was made (its date's latest day), as a real record would.
 * The steps are drawn first and trimmed after, so the seed's random draws stay as they were.
 */
function withBatchesMixedBy(
  steps: ProcessingStepInput[],
  madeOn: string,
  links: DemoLinks,
): ProcessingStepInput[] {
  const latest = parseApproximateDate(madeOn)?.to;
  const codeOf = new Map(Object.entries(links.batches).map(([code, id]) => [id, code]));
  return steps.map((step) => {
    if (step.solutionBatchId == null) return step;
    const mixed = MIXED_ON.get(codeOf.get(step.solutionBatchId) ?? '');
    return mixed && latest && latest < mixed ? { ...step, solutionBatchId: null } : step;
  });
}

/** Sixty-odd prints accessioned 2020–2026, mostly salt prints, a few rushed ones among them. */
export function demoPrints(rng: Random, links: DemoLinks): PrintCreateInput[] {
  const prints: PrintCreateInput[] = [];
  const perYear: Record<number, number> = {};
  for (let n = 0; n < 66; n += 1) {
    const year = 2020 + Math.floor((n * 7) / 66);
    perYear[year] = (perYear[year] ?? 0) + 1;
    const roll = rng.next();
    const process: Process =
      roll < 0.68
        ? 'salt print'
        : roll < 0.8
          ? 'albumen print'
          : roll < 0.92
            ? 'cyanotype'
            : 'platinum/palladium print';
    const [iw, ih, sw, sh] = rng.pick(SIZES);
    const madeYear = year - rng.int(0, 2);
    const subject = SUBJECTS[n % SUBJECTS.length]!;
    const processing =
      process === 'salt print' || process === 'albumen print'
        ? saltSteps(rng, links, year).filter(
            (step) => process === 'salt print' || step.stage !== 'salting',
          )
        : otherSteps(rng, process);
    // Drawn in the order the seed always drew them: maker, then date.
    const maker = rng.pick(MAKERS);
    const madeOn = madeOnFor(rng, madeYear);
    prints.push({
      accessionNumber: `${year}.${String(perYear[year]).padStart(4, '0')}`,
      title:
        n >= SUBJECTS.length
          ? `${subject} (${roman(Math.floor(n / SUBJECTS.length) + 1)})`
          : subject,
      maker,
      madeOn,
      process,
      paperId: process === 'albumen print' ? links.albumenPaper : rng.pick(links.papers),
      negativeId: rng.pick(links.negatives),
      locationId: rng.pick(links.places),
      imageWidthMm: iw,
      imageHeightMm: ih,
      sheetWidthMm: sw,
      sheetHeightMm: sh,
      edition: rng.chance(0.4) ? `${rng.int(1, 3)} of ${rng.int(3, 5)}` : null,
      status: rng.pick([
        'in storage',
        'in storage',
        'in storage',
        'on display',
        'on loan',
        'in treatment',
      ] as const),
      description: `${process[0]!.toUpperCase()}${process.slice(1)} made at the Mill Lane darkroom and given to the archive in ${year}.`,
      tags: [...new Set([rng.pick(TAGS), rng.pick(TAGS)])],
      processing: withBatchesMixedBy(processing, madeOn, links),
    });
  }
  return prints;
}

function madeOnFor(rng: Random, year: number): string {
  const kind = rng.next();
  if (kind < 0.6) return `${year}-${pad(rng.int(3, 10))}-${pad(rng.int(1, 28))}`;
  if (kind < 0.8) return `${year}-${pad(rng.int(1, 12))}`;
  if (kind < 0.92) return String(year);
  return `c. ${year}`;
}

function pad(n: number): string {
  return String(n).padStart(2, '0');
}

function roman(n: number): string {
  return ['', 'I', 'II', 'III', 'IV', 'V'][n] ?? String(n);
}

const DAY = 86_400_000;

/**
 * When each demo print was entered in the catalogue: spread evenly over its accession year (mid
 * January to mid December, the last year ending on the demo's "today"), so the start page's
 * "added in the last 30 days" shows a few prints, not the whole demo seeded a moment ago.
 */
export function demoCataloguedAt(accessionNumbers: readonly string[], now = new Date()): Date[] {
  const byYear = new Map<string, number[]>();
  accessionNumbers.forEach((number, index) => {
    const year = number.slice(0, 4);
    byYear.set(year, [...(byYear.get(year) ?? []), index]);
  });
  const dates: Date[] = [];
  for (const [year, indexes] of byYear) {
    const start = Date.parse(`${year}-01-15T10:00:00Z`);
    const lastDay = `${year}-12-15` < DEMO_TODAY ? `${year}-12-15` : DEMO_TODAY;
    const end = Date.parse(`${lastDay}T10:00:00Z`);
    indexes.forEach((index, i) => {
      const share = indexes.length === 1 ? 1 : i / (indexes.length - 1);
      const day = start + Math.round((share * (end - start)) / DAY) * DAY;
      dates[index] = new Date(Math.min(day, now.getTime())); // never after the seeding itself
    });
  }
  return dates;
}
