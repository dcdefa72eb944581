import sqlite3 from 'sqlite3';
import type { DocumentReader } from '../../server/services/search/documents';
import type { PrintQuery } from '../../shared/schemas/print';

/**
 * The embedded alternative: the same documents in SQLite FTS5 (through sqlite3), with the
 * filter values in a plain table joined by rowid. Filtered queries use CROSS JOIN so
 * SQLite runs MATCH once and then looks up each hit, instead of re-running MATCH per row.
 */
export class Fts5Peer {
  private constructor(private db: sqlite3.Database) {}

  static async build(file: string, reader: DocumentReader): Promise<Fts5Peer> {
    const peer = new Fts5Peer(new sqlite3.Database(file));
    await peer.exec(`PRAGMA journal_mode = WAL; PRAGMA synchronous = OFF;
      CREATE VIRTUAL TABLE fts USING fts5(accession, title, maker, tags, process, paper,
        negative, description, processing, place, tokenize = 'unicode61 remove_diacritics 2');
      CREATE TABLE meta (id INTEGER PRIMARY KEY, accession_number TEXT, title TEXT,
        process INTEGER, paper_id INTEGER, tone INTEGER, fixing REAL, washing REAL,
        made_from INTEGER, made_to INTEGER, risk INTEGER);
      BEGIN;`);
    const fts = peer.db.prepare(
      'INSERT INTO fts (rowid, accession, title, maker, tags, process, paper, negative, description, processing, place) VALUES (?,?,?,?,?,?,?,?,?,?,?)',
    );
    const meta = peer.db.prepare('INSERT INTO meta VALUES (?,?,?,?,?,?,?,?,?,?,?)');
    for (let after = 0; ;) {
      const { documents, last } = await reader.chunk(after, 2000);
      if (!documents.length) break;
      for (const d of documents) {
        const t = d.text;
        fts.run(
          d.printId,
          t.accessionNumber,
          t.title,
          t.maker,
          t.tags,
          t.process,
          t.paper,
          t.negative,
          t.description,
          t.processing,
          t.place,
        );
        const minutes = (value: number) => (Number.isNaN(value) ? null : value);
        meta.run(
          d.printId,
          d.accessionNumber,
          d.title,
          d.process,
          d.paperId || null,
          d.toneStatus,
          minutes(d.fixingMinutes),
          minutes(d.washingMinutes),
          d.madeFrom || null,
          d.madeTo || null,
          d.risk ? 1 : 0,
        );
      }
      after = last;
    }
    await new Promise<void>((resolve, reject) => fts.finalize((e) => (e ? reject(e) : resolve())));
    await new Promise<void>((resolve, reject) => meta.finalize((e) => (e ? reject(e) : resolve())));
    await peer.exec("COMMIT; INSERT INTO fts(fts) VALUES ('optimize');");
    return peer;
  }

  /** A page of 25 by bm25 (with the same field boosts) plus the total and facet counts. */
  async search(words: string, query: Partial<PrintQuery>, prefixLast: boolean): Promise<number> {
    const terms = words
      .split(/\s+/)
      .filter(Boolean)
      .map((w) => `"${w.replaceAll('"', '')}"`);
    if (prefixLast && terms.length) terms[terms.length - 1] += '*';
    const where: string[] = ['fts MATCH ?'];
    const values: unknown[] = [terms.join(' ')];
    const add = (sql: string, value: unknown) => {
      if (value === undefined) return;
      where.push(sql);
      values.push(value);
    };
    add('m.paper_id = ?', query.paperId);
    add('m.fixing >= ?', query.fixingMinutesMin);
    add('m.fixing <= ?', query.fixingMinutesMax);
    add('m.washing >= ?', query.washingMinutesMin);
    add('m.washing <= ?', query.washingMinutesMax);
    add('m.made_from <= ?', query.madeTo ? Number(query.madeTo.replaceAll('-', '')) : undefined);
    const from = `FROM fts CROSS JOIN meta m ON m.id = fts.rowid WHERE ${where.join(' AND ')}`;
    await this.all(
      `SELECT m.* ${from} ORDER BY bm25(fts, 6, 3, 2, 2, 1.5, 1.5, 1.5, 1, 1, 1) LIMIT 25`,
      values,
    );
    const groups = await this.all(
      `SELECT m.process, m.paper_id, m.tone, count(*) AS n ${from} GROUP BY 1, 2, 3`,
      values,
    );
    return groups.reduce<number>((sum, row) => sum + (row as { n: number }).n, 0);
  }

  close(): Promise<void> {
    return new Promise((resolve) => this.db.close(() => resolve()));
  }

  private exec(sql: string): Promise<void> {
    return new Promise((resolve, reject) => this.db.exec(sql, (e) => (e ? reject(e) : resolve())));
  }

  private all(sql: string, values: unknown[]): Promise<unknown[]> {
    return new Promise((resolve, reject) =>
      this.db.all(sql, values, (e, rows) => (e ? reject(e) : resolve(rows))),
    );
  }
}
