/**
 * The filter and sort values of every indexed document, one typed array per field,
 * indexed by slot. Filters and facet counts read these instead of asking SQL with a list
 * of ids. A replaced document gets a new slot; its old slot is marked dead.
 */
export interface ColumnValues {
  printId: number;
  accessionNumber: string;
  /** For ordering by title (as stored, like the SQL order). */
  title: string;
  /** Index into PROCESSES. */
  process: number;
  /** 0 when the print has no paper. */
  paperId: number;
  /** Index into TONE_STATUSES. */
  toneStatus: number;
  /** NaN when unknown. */
  fixingMinutes: number;
  washingMinutes: number;
  /** yyyymmdd; 0 when the print has no date. */
  madeFrom: number;
  madeTo: number;
  risk: boolean;
  deleted: boolean;
  /** The print's source (donor, seller); 0 when none. */
  sourceId: number;
  /** 1 + index into RIGHTS_STATEMENTS; 0 when the print has no rights statement. */
  rights: number;
}

const NUMERIC = {
  printId: Int32Array,
  process: Uint8Array,
  paperId: Int32Array,
  toneStatus: Uint8Array,
  fixingMinutes: Float32Array,
  washingMinutes: Float32Array,
  madeFrom: Int32Array,
  madeTo: Int32Array,
  risk: Uint8Array,
  deleted: Uint8Array,
  sourceId: Int32Array,
  rights: Uint8Array,
  live: Uint8Array,
} as const;
type NumericName = keyof typeof NUMERIC;
export type NumericColumns = { [K in NumericName]: InstanceType<(typeof NUMERIC)[K]> };

export class Columns {
  size = 0;
  capacity: number;
  numeric: NumericColumns;
  accessionNumber: string[] = [];
  title: string[] = [];

  constructor(capacity = 1024) {
    this.capacity = capacity;
    this.numeric = Columns.allocate(capacity);
  }

  private static allocate(capacity: number): NumericColumns {
    return Object.fromEntries(
      Object.entries(NUMERIC).map(([name, Type]) => [name, new Type(capacity)]),
    ) as unknown as NumericColumns;
  }

  /** Writes a document's values into a new slot and returns it. */
  append(values: ColumnValues): number {
    if (this.size === this.capacity) this.grow();
    const slot = this.size;
    const n = this.numeric;
    n.printId[slot] = values.printId;
    n.process[slot] = values.process;
    n.paperId[slot] = values.paperId;
    n.toneStatus[slot] = values.toneStatus;
    n.fixingMinutes[slot] = values.fixingMinutes;
    n.washingMinutes[slot] = values.washingMinutes;
    n.madeFrom[slot] = values.madeFrom;
    n.madeTo[slot] = values.madeTo;
    n.risk[slot] = values.risk ? 1 : 0;
    n.deleted[slot] = values.deleted ? 1 : 0;
    n.sourceId[slot] = values.sourceId;
    n.rights[slot] = values.rights;
    n.live[slot] = 1;
    this.accessionNumber[slot] = values.accessionNumber;
    this.title[slot] = values.title;
    this.size += 1;
    return slot;
  }

  /** The slot no longer answers (its print was replaced or removed for good). */
  retire(slot: number): void {
    this.numeric.live[slot] = 0;
    this.accessionNumber[slot] = '';
    this.title[slot] = '';
  }

  private grow(): void {
    const capacity = Math.max(16, this.capacity * 2);
    const next = Columns.allocate(capacity);
    for (const name of Object.keys(NUMERIC) as NumericName[])
      (next[name] as Int32Array).set(this.numeric[name] as Int32Array);
    this.numeric = next;
    this.capacity = capacity;
  }

  /** Restores columns written by a snapshot. */
  static fromArrays(
    size: number,
    numeric: NumericColumns,
    accessionNumber: string[],
    title: string[],
  ): Columns {
    const columns = new Columns(1);
    columns.size = size;
    columns.capacity = numeric.printId.length;
    columns.numeric = numeric;
    columns.accessionNumber = accessionNumber;
    columns.title = title;
    return columns;
  }

  static readonly names = Object.keys(NUMERIC) as NumericName[];
  static readonly types = NUMERIC;
}
