import type { Sequelize } from 'sequelize';
import type { Reading } from '../shared/domain/tone/comparison';
import { addDays, addMonths, daysBetween, YEAR_DAYS } from '../shared/domain/tone/dates';
import type { Process } from '../shared/domain/vocabulary';
import { writeTransaction } from '../server/db/write-transaction';
import { Print, ToneCheck, type User } from '../server/models';
import { evaluateStoredPrint } from '../server/services/tone/evaluate-print';
import { loadToneSettings } from '../server/services/tone/settings-store';
import type { Random } from './random';

/*
 * The demo tone histories come from this model (invented; its shape follows what the trade
 * says of salt prints, its sizes are ours):
 *
 * - Each print starts from typical CIELAB values of its process for the four patches
 *   (deepest shadow, midtone, highlight, bare paper).
 * - Change is linear in years since the baseline, at rates set by the processing:
 *   residual thiosulfate from a brief wash (under 5 min: full rate; 5–10 min: 40 %) yellows
 *   the highlights and paper (b* +1.2 a year) and fades the shadows (L* +1.0 a year, so
 *   density falls); residual silver from a brief fix (under 10 min) darkens the highlights
 *   and paper (L* −0.8 a year). Well-processed prints drift at 3–4 % of those rates; iron and
 *   platinum processes barely move. Each print's rates vary by ×0.7–1.3.
 * - Those rates are for prints kept in Cabinet 1, the store's cool dry cabinet. Elsewhere they
 *   are multiplied by how much faster the place's air ages paper than Cabinet 1's (its
 *   yearly relative decay rate over Cabinet 1's, demo-environment.ts): about 3.4 in the warm,
 *   damp Cabinet 2, so its prints change faster, as the demo readings say they should.
 * - Measurement noise is Gaussian with σ = 0.15 L* and σ = 0.10 a*, b*: about the
 *   repeatability of re-placing a handheld spectrophotometer on the same spot (ΔE*ab around
 *   0.2 — from memory), small beside the 1.0 ΔE00 watch threshold, so steady prints stay
 *   steady and trends show through.
 * - The baseline is 6–10 weeks after the print reached the archive (never on the day it was
 *   made), then a check every 6–12 months up to the demo's "today", at most 10.
 */
/** The invented scenario's "today": its last tone checks, catalogue entries and readings. */
export const DEMO_TODAY = '2026-11-15';
const MAX_CHECKS = 10;

type Base = Record<'dmax' | 'mid' | 'highlight' | 'dmin', [number, number, number]>;

const BASE: Record<Process, Base> = {
  'salt print': {
    dmax: [28, 7, 11],
    mid: [54, 5, 14],
    highlight: [87, 1.5, 7],
    dmin: [93, 0.5, 4.2],
  },
  'albumen print': { dmax: [24, 8, 8], mid: [50, 7, 12], highlight: [85, 2, 9], dmin: [91, 1, 8] },
  cyanotype: { dmax: [32, 4, -32], mid: [55, -3, -25], highlight: [85, -2, -6], dmin: [92, -1, 2] },
  'platinum/palladium print': {
    dmax: [22, 2, 6],
    mid: [52, 2, 8],
    highlight: [86, 1, 5],
    dmin: [93, 0.3, 3],
  },
  'hand-coated silver gelatin': {
    dmax: [18, 0.5, 1],
    mid: [50, 0.5, 3],
    highlight: [88, 0.3, 3],
    dmin: [94, 0.2, 2],
  },
};

const SILVER: ReadonlySet<Process> = new Set([
  'salt print',
  'albumen print',
  'hand-coated silver gelatin',
]);

interface Rates {
  yellowing: number;
  fading: number;
  darkening: number;
}

function ratesFor(print: Print, rng: Random, placeFactor: number): Rates {
  const spread = (0.7 + rng.next() * 0.6) * placeFactor;
  if (!SILVER.has(print.process))
    return { yellowing: 0.02 * spread, fading: 0.03 * spread, darkening: 0 };
  const wash = print.washingMinutes ?? 0;
  const fix = print.fixingMinutes ?? 0;
  const washFactor = wash < 5 ? 1 : wash < 10 ? 0.4 : 0.04;
  const fixFactor = fix < 10 ? 1 : 0.03;
  return {
    yellowing: 1.2 * washFactor * spread,
    fading: 1.0 * washFactor * spread,
    darkening: 0.8 * fixFactor * spread,
  };
}

/** A normal deviate (Box–Muller) from the seeded generator. */
function gaussian(rng: Random, sigma: number): number {
  const u = Math.max(rng.next(), 1e-12);
  return sigma * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng.next());
}

const round = (value: number) => Math.round(value * 100) / 100;

function readingsAt(base: Base, rates: Rates, years: number, rng: Random): Reading[] {
  const shift = {
    dmax: [rates.fading * years, 0, 0.2 * rates.yellowing * years],
    mid: [rates.fading * years * 0.8, 0, 0.5 * rates.yellowing * years],
    highlight: [-rates.darkening * years, 0, rates.yellowing * years * 0.9],
    dmin: [-rates.darkening * years, 0, rates.yellowing * years],
  } as const;
  return (Object.keys(base) as Array<keyof Base>).map((patch) => {
    const [L, a, b] = base[patch];
    const [dL, da, db] = shift[patch];
    return {
      patch,
      L: round(Math.min(100, Math.max(0, L + dL + gaussian(rng, 0.15)))),
      a: round(a + da + gaussian(rng, 0.1)),
      b: round(b + db + gaussian(rng, 0.1)),
    };
  });
}

function checkDates(print: Print, rng: Random): string[] {
  const accessionYear = Number(print.accessionNumber.slice(0, 4));
  const arrived = `${accessionYear}-${String(rng.int(1, 9)).padStart(2, '0')}-01`;
  const baseline = addDays(
    arrived > (print.madeTo ?? '') ? arrived : print.madeTo!,
    rng.int(42, 70),
  );
  const dates: string[] = [];
  for (let date = baseline; date <= DEMO_TODAY && dates.length < MAX_CHECKS;) {
    dates.push(date);
    date = addDays(addMonths(date, rng.int(6, 12)), rng.int(-10, 10));
  }
  return dates;
}

/** Tone histories for the demo prints, from the model above; returns prints with checks. */
export async function seedDemoToneHistories(
  sequelize: Sequelize,
  conservator: User,
  rng: Random,
  /** How much faster a print's place ages it than the reference cabinet (1 when unknown). */
  placeFactor: (locationId: number | null) => number = () => 1,
): Promise<number> {
  const prints = await Print.findAll({ order: [['id', 'ASC']] });
  const settings = await loadToneSettings();
  let seeded = 0;
  for (const print of prints) {
    const dates = checkDates(print, rng);
    const base = BASE[print.process];
    const rates = ratesFor(print, rng, placeFactor(print.locationId ?? null));
    if (dates.length === 0) continue;
    const rows = dates.map((checkedOn, index) => ({
      printId: print.id,
      checkedOn,
      checkedBy: conservator.id,
      method: 'spectrophotometer',
      instrument: 'Store-room spectrophotometer (demo)',
      illuminant: 'D50',
      observer: '2',
      baseline: index === 0,
      notes: null,
      readings: readingsAt(base, rates, daysBetween(dates[0]!, checkedOn) / YEAR_DAYS, rng),
    }));
    await writeTransaction(sequelize, async (transaction) => {
      // Evaluated before and after the latest check, so a change it brings opens an alert.
      await ToneCheck.bulkCreate(rows.slice(0, -1), { transaction });
      if (rows.length > 1) await evaluateStoredPrint(print.id, settings, transaction);
      await ToneCheck.create(rows[rows.length - 1]!, { transaction });
      await evaluateStoredPrint(print.id, settings, transaction);
    });
    seeded += 1;
  }
  return seeded;
}
