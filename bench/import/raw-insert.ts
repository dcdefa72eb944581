import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sqlite3 from 'sqlite3';
import { derivePrintFields } from '../../shared/domain/print-derived';
import type { PrintCreate } from '../../shared/schemas/print';
import { migrateUp } from '../../server/db/migrate';
import { openDatabase } from '../../server/db/sequelize';

const PRINT_COLUMNS = [
  'accession_number',
  'title',
  'maker',
  'made_on',
  'made_from',
  'made_to',
  'process',
  'status',
  'description',
  'tags',
  'fixing_minutes',
  'washing_minutes',
  'has_processing_risk',
  'risk_reasons',
  'tone_status',
  'created_at',
  'updated_at',
];
const STEP_COLUMNS = ['print_id', 'position', 'stage', 'minutes'];

function run(
  db: sqlite3.Database,
  sql: string,
  params: unknown[] = [],
): Promise<{ lastID: number }> {
  return new Promise((resolve, reject) => {
    db.run(sql, params, function done(this: sqlite3.RunResult, error: Error | null) {
      if (error) reject(error);
      else resolve({ lastID: this.lastID });
    });
  });
}

/**
 * The floor for the import: the same prints and steps written straight through sqlite3,
 * prepared statements in one transaction, on a fresh database with the same schema.
 * Returns rows per second.
 */
export async function rawInsertRowsPerSecond(prints: PrintCreate[]): Promise<number> {
  const dir = mkdtempSync(join(tmpdir(), 'printwarden-bench-raw-'));
  const file = join(dir, 'raw.sqlite');
  const sequelize = await openDatabase(`sqlite:${file}`);
  await migrateUp(sequelize);
  await sequelize.close();
  const db = new sqlite3.Database(file);
  const now = new Date().toISOString();
  const started = performance.now();
  const errors: Error[] = [];
  const collect = (error: Error | null) => {
    if (error) errors.push(error);
  };
  // Fresh database: ids are 1…n, so no statement waits for the one before it.
  db.serialize(() => {
    db.run('BEGIN IMMEDIATE', collect);
    const insertPrint = db.prepare(
      `INSERT INTO prints (id,${PRINT_COLUMNS.join(',')}) VALUES (?,${PRINT_COLUMNS.map(() => '?').join(',')})`,
    );
    const insertStep = db.prepare(
      `INSERT INTO processing_steps (${STEP_COLUMNS.join(',')}) VALUES (${STEP_COLUMNS.map(() => '?').join(',')})`,
    );
    prints.forEach((print, index) => {
      const printId = index + 1;
      const derived = derivePrintFields({
        madeOn: print.madeOn,
        process: print.process,
        processing: print.processing,
      });
      insertPrint.run(
        [
          printId,
          print.accessionNumber,
          print.title,
          print.maker,
          print.madeOn,
          derived.madeFrom,
          derived.madeTo,
          print.process,
          print.status,
          print.description,
          JSON.stringify(print.tags),
          derived.fixingMinutes,
          derived.washingMinutes,
          derived.hasProcessingRisk ? 1 : 0,
          JSON.stringify(derived.riskReasons),
          'unchecked',
          now,
          now,
        ],
        collect,
      );
      print.processing.forEach((step, position) =>
        insertStep.run([printId, position + 1, step.stage, step.minutes], collect),
      );
    });
    insertPrint.finalize();
    insertStep.finalize();
  });
  await run(db, 'COMMIT');
  if (errors.length) throw errors[0];
  const seconds = (performance.now() - started) / 1000;
  await new Promise<void>((resolve) => db.close(() => resolve()));
  rmSync(dir, { recursive: true, force: true });
  return prints.length / seconds;
}
