import { bandOf, FIXING_BAND_EDGES, WASHING_BAND_EDGES } from '../../../shared/domain/search-bands';
import type { NumericColumns } from './columns';

/** Counts over the matches of one query. Band arrays end with the count of unknowns. */
export interface EngineFacets {
  process: Map<number, number>;
  paperId: Map<number, number>;
  toneStatus: Map<number, number>;
  fixingBands: number[];
  washingBands: number[];
  /** By 1 + index into RIGHTS_STATEMENTS; prints without a statement are not counted. */
  rights: Map<number, number>;
}

/** One pass over the matching slots, reading the typed columns. */
export function facetsOf(n: NumericColumns, slots: Int32Array, count: number): EngineFacets {
  const process = new Uint32Array(256);
  const tone = new Uint32Array(256);
  const rights = new Uint32Array(256);
  const paper = new Map<number, number>();
  const fixing = new Array<number>(FIXING_BAND_EDGES.length + 1).fill(0);
  const washing = new Array<number>(WASHING_BAND_EDGES.length + 1).fill(0);
  for (let i = 0; i < count; i += 1) {
    const slot = slots[i]!;
    process[n.process[slot]!]! += 1;
    tone[n.toneStatus[slot]!]! += 1;
    rights[n.rights[slot]!]! += 1;
    const paperId = n.paperId[slot]!;
    if (paperId) paper.set(paperId, (paper.get(paperId) ?? 0) + 1);
    const fix = n.fixingMinutes[slot]!;
    fixing[Number.isNaN(fix) ? FIXING_BAND_EDGES.length : bandOf(fix, FIXING_BAND_EDGES)]! += 1;
    const wash = n.washingMinutes[slot]!;
    washing[Number.isNaN(wash) ? WASHING_BAND_EDGES.length : bandOf(wash, WASHING_BAND_EDGES)]! +=
      1;
  }
  const nonZero = (counts: Uint32Array) =>
    new Map([...counts.entries()].filter(([, value]) => value > 0));
  return {
    process: nonZero(process),
    paperId: paper,
    toneStatus: nonZero(tone),
    fixingBands: fixing,
    washingBands: washing,
    rights: new Map([...nonZero(rights)].filter(([index]) => index !== 0)),
  };
}
