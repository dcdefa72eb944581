import type { Sequelize, Transaction } from 'sequelize';
import type { SourceKind } from '../../shared/domain/registrar/vocabulary';
import { selectRows } from '../db/select-rows';
import type { Asset, Negative, Print, ProcessingStep } from '../models';
import {
  bool,
  date,
  decodeRow,
  json,
  maybeDate,
  selectList,
  stored,
  type Decoded,
  type Fields,
} from './decode-columns';

/**
 * A print's whole record in plain SQL: the print with its paper, negative and place in one
 * statement, its steps (with their batches) in one, its images in one, and the names above
 * its place in one. This is the record every answer about one print is built from; a read
 * through Sequelize's includes cost more than the rest of a create (the joined rows were
 * regrouped and a model built per row). A new column of prints is one line in
 * `PRINT_FIELDS` (and its type in the model).
 */
export const PRINT_FIELDS = {
  id: stored<number>(),
  accessionNumber: stored<string>(),
  title: stored<string>(),
  maker: stored<string | null>(),
  madeOn: stored<string | null>(),
  madeFrom: stored<string | null>(),
  madeTo: stored<string | null>(),
  process: stored<Print['process']>(),
  paperId: stored<number | null>(),
  negativeId: stored<number | null>(),
  locationId: stored<number | null>(),
  imageWidthMm: stored<number | null>(),
  imageHeightMm: stored<number | null>(),
  sheetWidthMm: stored<number | null>(),
  sheetHeightMm: stored<number | null>(),
  edition: stored<string | null>(),
  status: stored<Print['status']>(),
  description: stored<string | null>(),
  tags: json<string[]>(),
  fixingMinutes: stored<number | null>(),
  washingMinutes: stored<number | null>(),
  toneStatus: stored<Print['toneStatus']>(),
  nextCheckDue: stored<string | null>(),
  hasProcessingRisk: bool(),
  riskReasons: json<Print['riskReasons']>(),
  rectoAssetId: stored<number | null>(),
  toneBaselineOn: stored<string | null>(),
  toneFlags: json<Print['toneFlags']>(),
  toneUrgency: stored<number>(),
  toneRatePerYear: stored<number | null>(),
  toneSparkline: json<number[] | null>(),
  sourceId: stored<number | null>(),
  acquisition: json<Print['acquisition']>(),
  provenance: json<Print['provenance']>(),
  rightsStatement: stored<string | null>(),
  rights: json<Print['rights']>(),
  marks: json<Print['marks']>(),
  createdBy: stored<number | null>(),
  createdAt: date(),
  updatedAt: date(),
  deletedAt: maybeDate(),
} satisfies Fields;

const PAPER_FIELDS = { id: stored<number>(), name: stored<string>() } satisfies Fields;
const NEGATIVE_FIELDS = {
  id: stored<number>(),
  code: stored<string>(),
  kind: stored<Negative['kind']>(),
  format: stored<Negative['format']>(),
} satisfies Fields;
const SOURCE_FIELDS = {
  id: stored<number>(),
  name: stored<string>(),
  kind: stored<SourceKind>(),
} satisfies Fields;
const LOCATION_FIELDS = {
  id: stored<number>(),
  code: stored<string>(),
  name: stored<string>(),
} satisfies Fields;

export const STEP_FIELDS = {
  id: stored<number>(),
  printId: stored<number>(),
  position: stored<number>(),
  stage: stored<ProcessingStep['stage']>(),
  chemical: stored<string | null>(),
  concentrationPercent: stored<number | null>(),
  solutionBatchId: stored<number | null>(),
  method: stored<ProcessingStep['method']>(),
  coats: stored<number | null>(),
  minutes: stored<number | null>(),
  temperatureC: stored<number | null>(),
  lightSource: stored<ProcessingStep['lightSource']>(),
  notes: stored<string | null>(),
} satisfies Fields;
const BATCH_FIELDS = { id: stored<number>(), code: stored<string>() } satisfies Fields;

export const ASSET_FIELDS = {
  id: stored<number>(),
  printId: stored<number>(),
  view: stored<Asset['view']>(),
  originalName: stored<string | null>(),
  mediaType: stored<string>(),
  bytes: stored<number>(),
  sha256: stored<string>(),
  width: stored<number>(),
  height: stored<number>(),
  exif: json<Asset['exif']>(),
  status: stored<Asset['status']>(),
  progress: stored<number>(),
  error: stored<string | null>(),
  lastFixityAt: maybeDate(),
  lastFixityResult: stored<Asset['lastFixityResult']>(),
  createdAt: date(),
} satisfies Fields;

type Ref<F extends Fields> = Decoded<F> | null;

export type PrintStepRecord = Decoded<typeof STEP_FIELDS> & {
  solutionBatch: Ref<typeof BATCH_FIELDS>;
};
export type PrintAssetRecord = Decoded<typeof ASSET_FIELDS>;
export type PrintRecord = Decoded<typeof PRINT_FIELDS> & {
  paper: Ref<typeof PAPER_FIELDS>;
  negative: Ref<typeof NEGATIVE_FIELDS>;
  location: Ref<typeof LOCATION_FIELDS>;
  source: Ref<typeof SOURCE_FIELDS>;
  processing: PrintStepRecord[];
  assets: PrintAssetRecord[];
};

const PRINT_SQL = `SELECT ${selectList('p', PRINT_FIELDS)},
  ${selectList('pa', PAPER_FIELDS, 'paper.')},
  ${selectList('n', NEGATIVE_FIELDS, 'negative.')},
  ${selectList('l', LOCATION_FIELDS, 'location.')},
  ${selectList('so', SOURCE_FIELDS, 'source.')}
  FROM prints p
  LEFT JOIN papers pa ON pa.id = p.paper_id
  LEFT JOIN negatives n ON n.id = p.negative_id
  LEFT JOIN locations l ON l.id = p.location_id
  LEFT JOIN sources so ON so.id = p.source_id
  WHERE p.id = ?`;
const STEPS_SQL = `SELECT ${selectList('s', STEP_FIELDS)}, ${selectList('b', BATCH_FIELDS, 'batch.')}
  FROM processing_steps s LEFT JOIN solution_batches b ON b.id = s.solution_batch_id
  WHERE s.print_id = ? ORDER BY s.position, s.id`;
const ASSETS_SQL = `SELECT ${selectList('a', ASSET_FIELDS)} FROM assets a WHERE a.print_id = ? ORDER BY a.id`;
/** A place and those above it, nearest first; as deep as a path is ever shown (32). */
const PLACE_NAMES_SQL = `WITH RECURSIVE up (id, name, parent_id, depth) AS (
    SELECT id, name, parent_id, 0 FROM locations WHERE id = ?
    UNION ALL
    SELECT l.id, l.name, l.parent_id, up.depth + 1 FROM locations l JOIN up ON l.id = up.parent_id
    WHERE up.depth < 31
  ) SELECT name FROM up ORDER BY depth`;

type Row = Record<string, unknown>;

const refOf = <F extends Fields>(row: Row, fields: F, prefix: string): Ref<F> =>
  row[`${prefix}id`] == null ? null : decodeRow(row, fields, prefix);

/** The print's whole record, or null when there is none (or it is deleted, unless asked). */
export async function findPrintRecord(
  sequelize: Sequelize,
  id: number,
  options: { transaction?: Transaction | null; includeDeleted?: boolean } = {},
): Promise<PrintRecord | null> {
  const { transaction } = options;
  const [row] = await selectRows<Row>(sequelize, PRINT_SQL, [id], transaction);
  if (!row || (row.deletedAt != null && !options.includeDeleted)) return null;
  const [steps, assets] = await Promise.all([
    selectRows<Row>(sequelize, STEPS_SQL, [id], transaction),
    selectRows<Row>(sequelize, ASSETS_SQL, [id], transaction),
  ]);
  return {
    ...decodeRow(row, PRINT_FIELDS),
    paper: refOf(row, PAPER_FIELDS, 'paper.'),
    negative: refOf(row, NEGATIVE_FIELDS, 'negative.'),
    location: refOf(row, LOCATION_FIELDS, 'location.'),
    source: refOf(row, SOURCE_FIELDS, 'source.'),
    processing: steps.map((step) => ({
      ...decodeRow(step, STEP_FIELDS),
      solutionBatch: refOf(step, BATCH_FIELDS, 'batch.'),
    })),
    assets: assets.map((asset) => decodeRow(asset, ASSET_FIELDS)),
  };
}

/** The names of a place and every place above it, outermost first. */
export async function findPlaceNames(
  sequelize: Sequelize,
  locationId: number,
  transaction?: Transaction | null,
): Promise<string[]> {
  const rows = await selectRows<{ name: string }>(
    sequelize,
    PLACE_NAMES_SQL,
    [locationId],
    transaction,
  );
  return rows.map((row) => row.name).reverse();
}
