import { QueryTypes, type Sequelize } from 'sequelize';
import { onPrintsChanged } from '../../db/prints-changed';
import { DocumentReader, type SearchTextSource } from '../search/documents';
import { SearchEngine, type EngineQuery, type EngineResult } from '../search/engine';
import { readSnapshot, writeSnapshot } from '../search/snapshot';
import { readJson } from '../../repositories/decode-columns';

export type { SearchTextSource } from '../search/documents';

/** Where a long index job stands, for the progress the design asks of long work. */
export interface SearchIndexStatus {
  state: 'not built' | 'building' | 'ready' | 'rebuilding';
  done: number;
  total: number;
  documents: number;
  /** How the answering index came to be. */
  source: 'build' | 'snapshot' | null;
}

/** Prints read per step of a build; between steps the server answers other requests. */
const CHUNK = 1000;
/** Changes to any of these make a saved snapshot stale. */
const FINGERPRINT_SQL = `SELECT
  (SELECT count(*) || '/' || coalesce(CAST(max(updated_at) AS TEXT), '') || '/' || coalesce(CAST(max(deleted_at) AS TEXT), '') FROM prints) AS prints,
  (SELECT count(*) || '/' || coalesce(max(id), 0) FROM processing_steps) AS steps,
  (SELECT count(*) || '/' || coalesce(CAST(max(updated_at) AS TEXT), '') FROM papers) AS papers,
  (SELECT count(*) || '/' || coalesce(CAST(max(updated_at) AS TEXT), '') FROM negatives) AS negatives,
  (SELECT count(*) || '/' || coalesce(CAST(max(updated_at) AS TEXT), '') FROM solution_batches) AS batches,
  (SELECT count(*) || '/' || coalesce(CAST(max(updated_at) AS TEXT), '') FROM locations) AS locations,
  (SELECT coalesce(max(id), 0) FROM print_changes) AS changes`;

/**
 * The catalogue's word and filter index. Starts from a saved snapshot when one exists
 * (and rebuilds in the background when the snapshot is stale), else builds from the
 * database on first use. It follows every committed write through the "prints changed"
 * event, which reaches it before the writer answers, so the next request finds the change.
 */
export class PrintSearchIndex {
  private engine: SearchEngine | null = null;
  private starting: Promise<SearchEngine> | null = null;
  private rebuilding: Promise<void> | null = null;
  /** Prints changed while a rebuild runs, applied again to the new index before the swap. */
  private changedDuringRebuild = new Set<number>();
  /** Prints changed before the engine first answered, read into it before it does. */
  private changedWhileStarting = new Set<number>();
  private sources: SearchTextSource[] = [];
  private reader: DocumentReader;
  private progress: SearchIndexStatus = {
    state: 'not built',
    done: 0,
    total: 0,
    documents: 0,
    source: null,
  };

  constructor(
    private sequelize: Sequelize,
    private snapshotFile: string | null = null,
  ) {
    this.reader = new DocumentReader(sequelize, this.sources);
    // Every committed write that changed prints (or what they derive) reaches the index
    // before the writer answers; see db/prints-changed.ts.
    onPrintsChanged(sequelize, (change) => {
      // A place's name is part of the names of every place inside it: read them afresh.
      if (change.what.includes('linked')) this.reader.forgetPlaces();
      return this.refresh(change.printIds);
    });
  }

  /** Adds words from another area (condition, tone) to every print's document. */
  addTextSource(source: SearchTextSource): void {
    this.sources.push(source);
  }

  status(): SearchIndexStatus {
    return { ...this.progress, documents: this.engine?.documentCount ?? 0 };
  }

  /** The answering engine, starting it on first use. */
  ready(): Promise<SearchEngine> {
    if (this.engine) return Promise.resolve(this.engine);
    this.starting ??= this.start();
    return this.starting;
  }

  async query(query: EngineQuery): Promise<EngineResult> {
    return (await this.ready()).search(query);
  }

  /**
   * Re-reads the given prints (after their transaction committed) into the index. Private:
   * the one way in is a committed write's "prints changed" event (db/prints-changed.ts).
   */
  private async refresh(printIds: readonly number[]): Promise<void> {
    if (!printIds.length) return;
    if (!this.engine) {
      // Still starting (a first build takes seconds at 100,000 prints): the writer need not
      // wait for it. The ids are read into the new index before it answers its first query.
      for (const id of printIds) this.changedWhileStarting.add(id);
      void this.ready().catch(() => {});
      return;
    }
    await this.apply(this.engine, printIds);
    if (this.rebuilding) for (const id of printIds) this.changedDuringRebuild.add(id);
  }

  /** Puts the prints' current documents into `engine`; removes those no longer found. */
  private async apply(engine: SearchEngine, printIds: readonly number[]): Promise<void> {
    const documents = await this.reader.byIds(printIds);
    const found = new Set(documents.map((document) => document.printId));
    for (const document of documents) engine.put(document);
    for (const id of printIds) if (!found.has(id)) engine.remove(id);
  }

  /** Applies the changes noted while the engine started, until none are left. */
  private async catchUp(engine: SearchEngine): Promise<void> {
    while (this.changedWhileStarting.size) {
      const ids = [...this.changedWhileStarting];
      this.changedWhileStarting.clear();
      await this.apply(engine, ids);
    }
  }

  /** Builds a new index in the background; the current one answers until the swap. */
  rebuild(): Promise<void> {
    this.rebuilding ??= (async () => {
      try {
        this.changedDuringRebuild.clear();
        const engine = await this.build('rebuilding');
        const changed = [...this.changedDuringRebuild];
        for (const document of await this.reader.byIds(changed)) engine.put(document);
        this.engine = engine;
        this.progress.state = 'ready';
        this.progress.source = 'build';
      } finally {
        this.rebuilding = null;
      }
    })();
    return this.rebuilding;
  }

  /** Resolves once no build or rebuild is running (shutdown waits before closing the database). */
  async settled(): Promise<void> {
    await this.starting?.catch(() => undefined);
    await this.rebuilding?.catch(() => undefined);
  }

  /** Saves the answering index so the next start is quick. */
  async saveSnapshot(): Promise<void> {
    if (!this.snapshotFile || !this.engine) return;
    writeSnapshot(this.engine, await this.fingerprint(), this.snapshotFile);
  }

  private async start(): Promise<SearchEngine> {
    const saved = this.snapshotFile ? readSnapshot(this.snapshotFile) : null;
    if (saved) {
      const current = await this.fingerprint();
      if (saved.fingerprint !== current) {
        // Prints the change feed names since the snapshot go in before the first answer;
        // whatever else moved (a paper's name, a place) is caught by the rebuild.
        await this.replayChangesSince(saved.engine, saved.fingerprint);
        void this.rebuild().catch(() => {});
      }
      // No await between the catch-up and taking the engine: nothing noted in between.
      await this.catchUp(saved.engine);
      this.engine = saved.engine;
      this.progress = { ...this.progress, state: 'ready', source: 'snapshot' };
      return saved.engine;
    }
    const built = await this.build('building');
    await this.catchUp(built);
    this.engine = built;
    this.progress = { ...this.progress, state: 'ready', source: 'build' };
    return built;
  }

  /** Reads every print in chunks, yielding between them, then saves a snapshot. */
  private async build(state: 'building' | 'rebuilding'): Promise<SearchEngine> {
    const fingerprint = await this.fingerprint();
    const [counted] = await this.sequelize.query<{ total: number }>(
      'SELECT count(*) AS total FROM prints',
      { type: QueryTypes.SELECT },
    );
    this.progress = { ...this.progress, state, done: 0, total: counted?.total ?? 0 };
    this.reader.forgetPlaces();
    const engine = new SearchEngine();
    const bulk = engine.bulk();
    // SQLite reads the next chunk on its own thread while this one is indexed.
    let next = this.reader.chunk(0, CHUNK);
    for (;;) {
      const { documents, last } = await next;
      if (!documents.length) break;
      next = this.reader.chunk(last, CHUNK);
      // Observed here too, so a failed read is not unhandled if indexing fails first.
      next.catch(() => undefined);
      for (const document of documents) bulk.add(document);
      this.progress.done += documents.length;
      await new Promise((resolve) => setImmediate(resolve));
    }
    bulk.finish();
    if (this.snapshotFile) {
      // A snapshot only saves time at the next start: failing to write one is no failure.
      try {
        writeSnapshot(engine, fingerprint, this.snapshotFile);
      } catch (error) {
        console.error('The search index snapshot could not be written', error);
      }
    }
    return engine;
  }

  /** Re-reads into `engine` every print in the change feed after the snapshot's place in it. */
  private async replayChangesSince(engine: SearchEngine, fingerprint: string): Promise<void> {
    const since = Number((JSON.parse(fingerprint) as { changes?: number }).changes ?? 0);
    const rows = await this.sequelize.query<{ print_ids: unknown }>(
      'SELECT print_ids FROM print_changes WHERE id > ? ORDER BY id',
      { replacements: [since], type: QueryTypes.SELECT },
    );
    const ids = [...new Set(rows.flatMap((row) => readJson<number[]>(row.print_ids)))];
    for (let at = 0; at < ids.length; at += CHUNK) {
      const part = ids.slice(at, at + CHUNK);
      const documents = await this.reader.byIds(part);
      const found = new Set(documents.map((document) => document.printId));
      for (const document of documents) engine.put(document);
      for (const id of part) if (!found.has(id)) engine.remove(id);
    }
  }

  private async fingerprint(): Promise<string> {
    const [row] = await this.sequelize.query<Record<string, string>>(FINGERPRINT_SQL, {
      type: QueryTypes.SELECT,
    });
    return JSON.stringify(row);
  }
}
