import express, { type Express } from 'express';
import sqlite3 from 'sqlite3';

/**
 * The floor the api suite compares against: a bare Express app answering the same
 * questions from its own copy of the database through raw sqlite3 and hand-written SQL —
 * the same page with its paper join and facet counts, the same record, and a create
 * with the same inserts (counter, print, six steps, audit event) in one transaction.
 */
type Params = Array<string | number | null>;

function promised(db: sqlite3.Database) {
  const all = <T>(sql: string, params: Params = []) =>
    new Promise<T[]>((resolve, reject) =>
      db.all(sql, params, (error, rows) => (error ? reject(error) : resolve(rows as T[]))),
    );
  const run = (sql: string, params: Params = []) =>
    new Promise<number>((resolve, reject) =>
      db.run(sql, params, function done(error) {
        if (error) reject(error);
        else resolve(this.lastID);
      }),
    );
  return { all, run };
}

const LIST_SQL = `SELECT p.id, p.accession_number, p.title, p.maker, p.made_on, p.process,
  p.paper_id, pa.name AS paper_name, p.fixing_minutes, p.washing_minutes, p.tone_status,
  p.has_processing_risk, p.status
  FROM prints p LEFT JOIN papers pa ON pa.id = p.paper_id
  WHERE p.deleted_at IS NULL AND (? IS NULL OR p.title LIKE ?) AND (? IS NULL OR p.fixing_minutes >= ?)
  ORDER BY p.accession_number DESC LIMIT ? OFFSET ?`;
const FACET_SQL = `SELECT process, paper_id, tone_status, COUNT(id) AS count FROM prints
  WHERE deleted_at IS NULL AND (? IS NULL OR title LIKE ?) AND (? IS NULL OR fixing_minutes >= ?)
  GROUP BY process, paper_id, tone_status`;

type Row = Record<string, unknown>;

function tally(rows: Row[], key: string) {
  const counts = new Map<unknown, number>();
  for (const row of rows) counts.set(row[key], (counts.get(row[key]) ?? 0) + Number(row.count));
  return [...counts].map(([value, count]) => ({ value, count })).sort((a, b) => b.count - a.count);
}

/** A JavaScript queue of writers, as in Printwarden, so both wait the same way. */
function writeQueue() {
  let last: Promise<unknown> = Promise.resolve();
  return <T>(work: () => Promise<T>): Promise<T> => {
    const next = last.catch(() => undefined).then(work);
    last = next.catch(() => undefined);
    return next;
  };
}

export async function rawPeerApp(file: string): Promise<Express> {
  const db = new sqlite3.Database(file);
  const { all, run } = promised(db);
  await run('PRAGMA journal_mode = WAL');
  await run('PRAGMA synchronous = NORMAL');
  await run('PRAGMA foreign_keys = ON');
  const queued = writeQueue();
  const app = express();
  app.use(express.json({ limit: '1mb' }));

  app.get('/api/prints', async (req, res) => {
    const page = Math.max(1, Number(req.query.page ?? 1));
    const q = typeof req.query.q === 'string' ? `%${req.query.q}%` : null;
    const fixing = req.query.fixingMinutesMin ? Number(req.query.fixingMinutesMin) : null;
    const filter: Params = [q, q, fixing, fixing];
    const [rows, facets] = await Promise.all([
      all<Row>(LIST_SQL, [...filter, 25, (page - 1) * 25]),
      all<Row>(FACET_SQL, filter),
    ]);
    res.json({
      items: rows.map((row) => ({
        id: row.id,
        accessionNumber: row.accession_number,
        title: row.title,
        maker: row.maker,
        madeOn: row.made_on,
        process: row.process,
        paper: row.paper_id ? { id: row.paper_id, name: row.paper_name } : null,
        fixingMinutes: row.fixing_minutes,
        washingMinutes: row.washing_minutes,
        toneStatus: row.tone_status,
        processingRisk: row.has_processing_risk === 1,
        status: row.status,
      })),
      total: facets.reduce((sum, row) => sum + Number(row.count), 0),
      page,
      pageSize: 25,
      facets: {
        process: tally(facets, 'process'),
        paperId: tally(facets, 'paper_id'),
        toneStatus: tally(facets, 'tone_status'),
      },
    });
  });

  app.get('/api/prints/:id', async (req, res) => {
    const id = Number(req.params.id);
    const [prints, steps] = await Promise.all([
      all<Row>(
        `SELECT p.*, pa.name AS paper_name, n.code AS negative_code, l.name AS location_name
         FROM prints p LEFT JOIN papers pa ON pa.id = p.paper_id
         LEFT JOIN negatives n ON n.id = p.negative_id LEFT JOIN locations l ON l.id = p.location_id
         WHERE p.id = ? AND p.deleted_at IS NULL`,
        [id],
      ),
      all<Row>(
        `SELECT s.*, b.code AS batch_code FROM processing_steps s
         LEFT JOIN solution_batches b ON b.id = s.solution_batch_id WHERE s.print_id = ? ORDER BY s.position`,
        [id],
      ),
    ]);
    if (!prints[0]) return res.status(404).json({ status: 404 });
    res.json({ ...prints[0], processing: steps });
  });

  app.post('/api/prints', async (req, res) => {
    const body = req.body as Record<string, unknown> & { processing: Row[]; tags: string[] };
    const id = await queued(async () => {
      await run('BEGIN IMMEDIATE');
      try {
        const year = new Date().getFullYear();
        const [counter] = await all<{ last: number }>(
          'SELECT last FROM accession_counters WHERE year = ?',
          [year],
        );
        const next = (counter?.last ?? 0) + 1;
        await run('INSERT OR REPLACE INTO accession_counters (year, last) VALUES (?, ?)', [
          year,
          next,
        ]);
        const now = new Date().toISOString();
        const printId = await run(
          `INSERT INTO prints (accession_number, title, maker, made_on, process, status, description, tags,
             image_width_mm, image_height_mm, sheet_width_mm, sheet_height_mm, tone_status, risk_reasons,
             has_processing_risk, created_at, updated_at)
           VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 'unchecked', '[]', 0, ?, ?)`,
          [
            `${year}.R${String(next).padStart(6, '0')}`,
            String(body.title),
            String(body.maker ?? ''),
            String(body.madeOn ?? ''),
            String(body.process),
            String(body.status),
            String(body.description ?? ''),
            JSON.stringify(body.tags ?? []),
            Number(body.imageWidthMm ?? 0),
            Number(body.imageHeightMm ?? 0),
            Number(body.sheetWidthMm ?? 0),
            Number(body.sheetHeightMm ?? 0),
            now,
            now,
          ],
        );
        for (const [index, step] of body.processing.entries()) {
          await run(
            `INSERT INTO processing_steps (print_id, position, stage, chemical, concentration_percent, method, coats, minutes, temperature_c, light_source)
             VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)`,
            [
              printId,
              index + 1,
              String(step.stage),
              (step.chemical as string) ?? null,
              (step.concentrationPercent as number) ?? null,
              (step.method as string) ?? null,
              (step.coats as number) ?? null,
              (step.minutes as number) ?? null,
              (step.temperatureC as number) ?? null,
              (step.lightSource as string) ?? null,
            ],
          );
        }
        await run(
          `INSERT INTO audit_events (at, user_id, action, entity, entity_id, before, after) VALUES (?, NULL, 'create', 'print', ?, NULL, ?)`,
          [now, printId, JSON.stringify(body)],
        );
        await run('COMMIT');
        return printId;
      } catch (error) {
        await run('ROLLBACK');
        throw error;
      }
    });
    res.status(201).json({ id, ...body });
  });

  return app;
}
