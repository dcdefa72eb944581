import type { NumericColumns } from './columns';

/** Exact filters, in the columns' units (indexes, ids, minutes, yyyymmdd). */
export interface EngineFilters {
  process?: number;
  paperId?: number;
  toneStatus?: number;
  fixingMinutesMin?: number;
  fixingMinutesMax?: number;
  washingMinutesMin?: number;
  washingMinutesMax?: number;
  /** Keep prints whose (approximate) date range overlaps [madeFrom, madeTo]. */
  madeFrom?: number;
  madeTo?: number;
  risk?: boolean;
  sourceId?: number;
  /** 1 + index into RIGHTS_STATEMENTS. */
  rights?: number;
  /** true: only deleted prints; false: only live ones. */
  deleted: boolean;
}

/**
 * A test of one slot against every filter. A minutes filter never keeps a print whose
 * minutes are unknown (NaN fails every comparison), as in SQL where NULL fails.
 */
export function matcherOf(n: NumericColumns, f: EngineFilters): (slot: number) => boolean {
  const deleted = f.deleted ? 1 : 0;
  const risk = f.risk === undefined ? -1 : f.risk ? 1 : 0;
  const fixMin = f.fixingMinutesMin ?? -Infinity;
  const fixMax = f.fixingMinutesMax ?? Infinity;
  const fixing = f.fixingMinutesMin !== undefined || f.fixingMinutesMax !== undefined;
  const washMin = f.washingMinutesMin ?? -Infinity;
  const washMax = f.washingMinutesMax ?? Infinity;
  const washing = f.washingMinutesMin !== undefined || f.washingMinutesMax !== undefined;
  return (slot) => {
    if (n.live[slot] !== 1 || n.deleted[slot] !== deleted) return false;
    if (f.process !== undefined && n.process[slot] !== f.process) return false;
    if (f.paperId !== undefined && n.paperId[slot] !== f.paperId) return false;
    if (f.toneStatus !== undefined && n.toneStatus[slot] !== f.toneStatus) return false;
    if (risk !== -1 && n.risk[slot] !== risk) return false;
    if (f.sourceId !== undefined && n.sourceId[slot] !== f.sourceId) return false;
    if (f.rights !== undefined && n.rights[slot] !== f.rights) return false;
    if (fixing) {
      const minutes = n.fixingMinutes[slot]!;
      if (!(minutes >= fixMin && minutes <= fixMax)) return false;
    }
    if (washing) {
      const minutes = n.washingMinutes[slot]!;
      if (!(minutes >= washMin && minutes <= washMax)) return false;
    }
    // A print without a date has no range to overlap.
    if (f.madeFrom !== undefined && !(n.madeTo[slot]! !== 0 && n.madeTo[slot]! >= f.madeFrom))
      return false;
    if (f.madeTo !== undefined && !(n.madeFrom[slot]! !== 0 && n.madeFrom[slot]! <= f.madeTo))
      return false;
    return true;
  };
}

/** "2019-06-01" → 20190601; the columns keep dates as comparable integers. */
export function dateNumber(iso: string | null | undefined): number {
  return iso ? Number(iso.slice(0, 10).replaceAll('-', '')) : 0;
}
