import type { Sequelize } from 'sequelize';
import { derivePrintFields } from '../../shared/domain/print-derived';
import type { TimedStep } from '../../shared/domain/processing';
import type { Process, Stage } from '../../shared/domain/vocabulary';
import { seededRandom, type Random } from '../../seeds/random';

/**
 * A generated collection for the search bench: invented words and names drawn with a
 * skewed frequency as real catalogue text is, and processing histories like
 * the demo darkroom's (salt prints mostly, some rushed). Written with raw multi-row
 * INSERTs in one transaction: 100,000 prints in seconds, not through the API.
 */
const COMMON = `mill pond weir lane orchard field river bank bridge church yard cottage gate wall
hedge willow reeds lock sluice barn quarry chapel market hall roof window door tree trees
elm oak ash yew frost snow rain fog dusk dawn evening morning winter summer autumn spring
light shadow water stone path road track hill valley moor marsh meadow boat ferry steps
garden allotment shed shop street house houses figure figures portrait study sky clouds`.split(
  /\s+/,
);
const STOCK = `print sheet coating uneven edge margin mount mat toned warm cool tone highlight
shadows midtones detail soft sharp faded stain foxing spot spots silvering crease tear
pencil inscription verso recto signed dated numbered edition proof trial variant`.split(/\s+/);
const SYLLABLES = `ba be bi bo bu da de di do ka ke ki ko la le li lo lu ma me mi mo na ne ni no
ra re ri ro ru sa se si so ta te ti to va ve vi wa we wi ya yo zen mar tor wen dal fen
har nor ost rin sel tam ul vor brae glen holt`.split(/\s+/);

export interface CorpusCounts {
  prints: number;
  steps: number;
}

const quote = (value: string | number | null | undefined) =>
  value == null
    ? 'NULL'
    : typeof value === 'number'
      ? String(value)
      : `'${value.replaceAll("'", "''")}'`;

/** A word list of invented words (place names, makers' surnames, rare description words). */
function inventedWords(rng: Random, count: number): string[] {
  const words = new Set<string>();
  while (words.size < count)
    words.add(Array.from({ length: rng.int(2, 4) }, () => rng.pick(SYLLABLES)).join(''));
  return [...words];
}

/**
 * Picks with a skew towards the front of the list (P(rank < k) = sqrt(k / n)): a few words
 * are common, most are rare, as in catalogue text once stop words are gone.
 */
function skewed(rng: Random, words: readonly string[]): string {
  return words[Math.floor(words.length * rng.next() ** 2)]!;
}

interface StepRow extends TimedStep {
  stage: Stage;
  chemical?: string;
  concentration?: number;
  method?: string;
  coats?: number;
  temperature?: number;
  light?: string;
  batch?: number;
  notes?: string;
}

function saltSteps(rng: Random, batches: number): StepRow[] {
  const rushed = rng.chance(0.18);
  const steps: StepRow[] = [
    {
      stage: 'salting',
      chemical: 'sodium chloride',
      concentration: rng.pick([1.5, 2, 2.5]),
      method: 'floated',
      minutes: rng.int(2, 4),
      batch: rng.int(1, batches),
    },
    {
      stage: 'sensitizing',
      chemical: 'silver nitrate',
      concentration: rng.pick([10, 12, 15]),
      method: rng.pick(['swabbed', 'brushed', 'rod-coated']),
      coats: rng.int(1, 2),
      minutes: null,
      batch: rng.int(1, batches),
    },
    {
      stage: 'exposure',
      light: rng.pick(['open shade', 'direct sun', 'UV unit']),
      method: 'contact frame',
      minutes: rng.int(6, 70),
    },
  ];
  if (!rushed || rng.chance(0.5))
    steps.push({ stage: 'prewash', method: 'running water', minutes: rng.int(2, 5) });
  if (rng.chance(0.25))
    steps.push({
      stage: 'toning',
      chemical: 'gold chloride',
      concentration: 0.2,
      minutes: rng.int(3, 8),
    });
  steps.push({
    stage: 'fixing',
    chemical: rng.chance(0.1) ? 'hypo' : 'sodium thiosulfate',
    concentration: rng.pick([10, 15, 20]),
    method: 'tray, agitated',
    minutes: rushed ? rng.int(3, 8) : rng.int(10, 16),
    temperature: rng.int(18, 22),
    batch: rng.int(1, batches),
  });
  steps.push({
    stage: 'washing',
    method: 'running water',
    minutes: rushed ? rng.pick([3, 4, 6, 8]) : rng.int(12, 40),
    temperature: rng.int(14, 20),
    notes: rng.chance(0.05) ? 'wash water cloudy' : undefined,
  });
  steps.push({
    stage: 'drying',
    method: rng.pick(['between blotters', 'air-dried']),
    minutes: rng.int(120, 720),
  });
  return steps;
}

function cyanotypeSteps(rng: Random): StepRow[] {
  return [
    {
      stage: 'sensitizing',
      chemical: 'ferric ammonium citrate and potassium ferricyanide',
      method: 'brushed',
      coats: 1,
      minutes: null,
    },
    { stage: 'exposure', light: 'UV unit', minutes: rng.int(8, 20) },
    { stage: 'washing', method: 'running water', minutes: rng.pick([4, 10, 15, 20]) },
    { stage: 'drying', method: 'air-dried', minutes: 240 },
  ];
}

/** Fills papers, negatives, places, batches and `count` prints with their steps. */
export async function fillSearchCorpus(sequelize: Sequelize, count: number): Promise<CorpusCounts> {
  const rng = seededRandom(1905);
  const rare = inventedWords(rng, 6000);
  const surnames = inventedWords(rng, 900).map((w) => w[0]!.toUpperCase() + w.slice(1));
  const now = `'2026-01-01 00:00:00.000 +00:00'`;
  const papers = [
    'Hot-pressed cotton rag 300',
    'Cold-pressed cotton rag 250',
    'Gelatin-sized writing paper 120',
    'Kozo tissue 45',
    'Albumenised sheet 90',
    ...Array.from({ length: 15 }, (_, i) => `Mill paper ${rare[i]} ${100 + i * 10}`),
  ];
  const batches = 300;
  let steps = 0;
  // A throwaway database: no fsync per commit, and room in the cache for the indexes.
  await sequelize.query('PRAGMA synchronous = OFF');
  await sequelize.query('PRAGMA cache_size = -262144');
  await sequelize.transaction(async (transaction) => {
    const run = (sql: string) => sequelize.query(sql, { transaction });
    await run(
      `INSERT INTO papers (name, fibre, created_at, updated_at) VALUES ${papers.map((name, i) => `(${quote(name)}, ${quote(i < 2 ? 'cotton rag' : 'cotton')}, ${now}, ${now})`).join(',')}`,
    );
    await run(
      `INSERT INTO negatives (code, kind, subject, created_at, updated_at) VALUES ${Array.from({ length: 2000 }, (_, i) => `('GP-${i + 1}', 'glass plate', ${quote(`${skewed(rng, COMMON)} ${rng.pick(rare)}`)}, ${now}, ${now})`).join(',')}`,
    );
    await run(
      `INSERT INTO locations (code, name, created_at, updated_at) VALUES ${Array.from({ length: 60 }, (_, i) => `('LOC-${i + 1}', ${quote(`Cabinet ${rng.pick(rare)} ${i + 1}`)}, ${now}, ${now})`).join(',')}`,
    );
    await run(
      `INSERT INTO solution_batches (code, kind, chemical, created_at, updated_at) VALUES ${Array.from({ length: batches }, (_, i) => `('B-${String(i + 1).padStart(3, '0')}', 'fixer', 'sodium thiosulfate', ${now}, ${now})`).join(',')}`,
    );
    for (let start = 0; start < count; start += 500) {
      const printRows: string[] = [];
      const stepRows: string[] = [];
      for (let i = start; i < Math.min(count, start + 500); i += 1) {
        const process: Process = rng.chance(0.75)
          ? 'salt print'
          : rng.chance(0.6)
            ? 'cyanotype'
            : 'albumen print';
        const processing = process === 'cyanotype' ? cyanotypeSteps(rng) : saltSteps(rng, batches);
        const year = rng.int(1995, 2026);
        const madeOn = rng.chance(0.2)
          ? `c. ${year}`
          : `${year}-${String(rng.int(1, 12)).padStart(2, '0')}`;
        const derived = derivePrintFields({ madeOn, process, processing });
        const title = [
          rng.pick(COMMON),
          rng.chance(0.5) ? rng.pick(COMMON) : rng.pick(rare),
          rng.chance(0.4) ? rng.pick(rare) : '',
        ]
          .filter(Boolean)
          .join(' ');
        const description = Array.from({ length: rng.int(6, 24) }, () =>
          rng.chance(0.25)
            ? rng.pick(COMMON)
            : rng.chance(0.2)
              ? rng.pick(STOCK)
              : skewed(rng, rare),
        ).join(' ');
        // "river" on about a fifth of the prints: the broad word of the bench's last class.
        const tags = [
          rng.chance(0.2) ? 'river' : skewed(rng, COMMON),
          ...(rng.chance(0.5) ? [rng.pick(rare)] : []),
        ];
        printRows.push(
          `(${i + 1}, ${quote(`${2000 + (i % 27)}.${String(i + 1).padStart(6, '0')}`)}, ${quote(title[0]!.toUpperCase() + title.slice(1))}, ${quote(`${rng.pick(['A.', 'B.', 'E.', 'J.', 'M.', 'R.'])} ${skewed(rng, surnames)}`)}, ${quote(madeOn)}, ${quote(derived.madeFrom)}, ${quote(derived.madeTo)}, ${quote(process)}, ${rng.int(1, papers.length)}, ${rng.int(1, 2000)}, ${rng.int(1, 60)}, 'in storage', ${quote(description)}, ${quote(JSON.stringify(tags))}, ${quote(derived.fixingMinutes)}, ${quote(derived.washingMinutes)}, ${quote(rng.pick(['unchecked', 'unchecked', 'steady', 'watch', 'fading', 'yellowing']))}, ${derived.hasProcessingRisk ? 1 : 0}, ${quote(JSON.stringify(derived.riskReasons))}, '[]', '[]', '[]', ${now}, ${now})`,
        );
        processing.forEach((step, position) => {
          stepRows.push(
            `(${i + 1}, ${position + 1}, ${quote(step.stage)}, ${quote(step.chemical)}, ${quote(step.concentration)}, ${quote(step.batch)}, ${quote(step.method)}, ${quote(step.coats)}, ${quote(step.minutes)}, ${quote(step.temperature)}, ${quote(step.light)}, ${quote(step.notes)})`,
          );
        });
      }
      // JSON list columns named, as the app names them: their SQLite defaults are the
      // string "[]" (migration 0021).
      await run(
        `INSERT INTO prints (id, accession_number, title, maker, made_on, made_from, made_to, process, paper_id, negative_id, location_id, status, description, tags, fixing_minutes, washing_minutes, tone_status, has_processing_risk, risk_reasons, tone_flags, provenance, marks, created_at, updated_at) VALUES ${printRows.join(',')}`,
      );
      await run(
        `INSERT INTO processing_steps (print_id, position, stage, chemical, concentration_percent, solution_batch_id, method, coats, minutes, temperature_c, light_source, notes) VALUES ${stepRows.join(',')}`,
      );
      steps += stepRows.length;
    }
  });
  return { prints: count, steps };
}
