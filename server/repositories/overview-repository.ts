import { QueryTypes, type Sequelize } from 'sequelize';
import { dialectOf, type SqlDialect } from '../db/dialect';
import { OPEN_STAGES } from '../../shared/domain/loans';
import { readDate, readJson } from './decode-columns';

/**
 * The start page's counts, each one statement over one index (migration 0013). The partial
 * indexes over live prints are named through the dialect (`INDEXED BY` on SQLite, which
 * keeps no ANALYZE statistics here and would take `deleted_at IS NULL` for a selective
 * equality).
 */
export class OverviewCounts {
  private readonly dialect: SqlDialect;

  constructor(private readonly sequelize: Sequelize) {
    this.dialect = dialectOf(sequelize);
  }

  private indexed(name: string): string {
    return this.dialect.indexHint(name);
  }

  private async one<T extends object>(
    sql: string,
    replacements: unknown[] = [],
  ): Promise<T | undefined> {
    const [row] = await this.sequelize.query<T>(sql, { type: QueryTypes.SELECT, replacements });
    return row;
  }

  private async count(sql: string, replacements: unknown[] = []): Promise<number> {
    return (await this.one<{ n: number }>(sql, replacements))?.n ?? 0;
  }

  /** Live prints whose next check falls in [from, to] (dates as YYYY-MM-DD). */
  checksDue(from: string, to: string): Promise<number> {
    return this.count(
      `SELECT COUNT(*) AS n FROM prints ${this.indexed('prints_live_next_check')}
        WHERE deleted_at IS NULL AND next_check_due >= ? AND next_check_due <= ?`,
      [from, to],
    );
  }

  /** Live prints whose next check was due before `today`. */
  checksOverdue(today: string): Promise<number> {
    return this.count(
      `SELECT COUNT(*) AS n FROM prints ${this.indexed('prints_live_next_check')}
        WHERE deleted_at IS NULL AND next_check_due < ?`,
      [today],
    );
  }

  openAlerts(): Promise<number> {
    return this.count('SELECT COUNT(*) AS n FROM alerts WHERE acknowledged_at IS NULL');
  }

  /** Places outside their storage band, not yet acknowledged (a few rows a place at most). */
  openPlaceAlerts(): Promise<number> {
    return this.count('SELECT COUNT(*) AS n FROM environment_alerts WHERE acknowledged_at IS NULL');
  }

  /** Prints whose tone status changed (an alert other than an overdue check) since `since`. */
  statusChangedSince(since: Date): Promise<number> {
    return this.count(
      `SELECT COUNT(DISTINCT print_id) AS n FROM alerts ${this.indexed('alerts_opened')}
        WHERE opened_at > ? AND kind <> 'check-overdue'`,
      [since],
    );
  }

  /** Live prints created since `since` (accessions, or additions for a reader). */
  printsCreatedSince(since: Date): Promise<number> {
    return this.count(
      `SELECT COUNT(*) AS n FROM prints ${this.indexed('prints_live_created')}
        WHERE deleted_at IS NULL AND created_at > ?`,
      [since],
    );
  }

  processingConcerns(): Promise<number> {
    return this.count(
      `SELECT COUNT(*) AS n FROM prints ${this.indexed('prints_live_risk')}
        WHERE deleted_at IS NULL AND has_processing_risk = ${this.dialect.true}`,
    );
  }

  /** Images still being made into web copies and tiles, and the print of the oldest. */
  async imagesProcessing(): Promise<{ count: number; printId: number | null }> {
    const count = await this.count("SELECT COUNT(*) AS n FROM assets WHERE status = 'processing'");
    const first = count
      ? await this.one<{ print_id: number }>(
          "SELECT print_id FROM assets WHERE status = 'processing' ORDER BY id LIMIT 1",
        )
      : undefined;
    return { count, printId: first?.print_id ?? null };
  }

  importsUnderWay(): Promise<number> {
    return this.count(
      "SELECT COUNT(*) AS n FROM import_jobs WHERE status IN ('queued', 'running')",
    );
  }

  savedSearches(userId: number): Promise<number> {
    return this.count('SELECT COUNT(*) AS n FROM saved_searches WHERE user_id = ?', [userId]);
  }

  checklists(): Promise<number> {
    return this.count('SELECT COUNT(*) AS n FROM checklists');
  }

  /** Loans and exhibitions not yet back or withdrawn (a table of tens of rows: no index). */
  openLoans(): Promise<number> {
    return this.count(
      `SELECT COUNT(*) AS n FROM loans WHERE stage IN (${OPEN_STAGES.map(() => '?').join(', ')})`,
      [...OPEN_STAGES],
    );
  }

  /** Messages queued or given up on: not delivered. */
  undeliveredMail(): Promise<number> {
    return this.count("SELECT COUNT(*) AS n FROM mail_queue WHERE status IN ('pending', 'failed')");
  }

  openInvitations(now: Date): Promise<number> {
    return this.count(
      `SELECT COUNT(*) AS n FROM invitations
        WHERE accepted_at IS NULL AND revoked_at IS NULL AND expires_at > ?`,
      [now],
    );
  }

  /** The last fixity run, its JSON lists decoded. */
  async lastFixityCheck() {
    const row = await this.one<{
      status: string;
      checked: number;
      total: number;
      mismatches: string;
      missing: string;
      finished_at: unknown;
      created_at: unknown;
    }>(
      `SELECT status, checked, total, mismatches, missing, finished_at, created_at
         FROM fixity_checks ORDER BY id DESC LIMIT 1`,
    );
    if (!row) return undefined;
    return {
      ...row,
      finished_at: row.finished_at === null ? null : readDate(row.finished_at),
      created_at: readDate(row.created_at),
      mismatches: readJson<unknown[]>(row.mismatches),
      missing: readJson<unknown[]>(row.missing),
    };
  }

  async lastBackup() {
    const row = await this.one<{ made_at: unknown; bytes: number }>(
      'SELECT made_at, bytes FROM backups ORDER BY id DESC LIMIT 1',
    );
    return row && { madeAt: readDate(row.made_at), bytes: row.bytes };
  }

  /** Bytes of stored originals, each stored file once (the same file uploaded twice is kept once). */
  async originalBytes(): Promise<number> {
    const row = await this.one<{ n: number | null }>(
      `SELECT SUM(bytes) AS n FROM (SELECT MAX(bytes) AS bytes
         FROM assets ${this.indexed('assets_sha_bytes')} GROUP BY sha256) AS stored`,
    );
    return row?.n ?? 0;
  }
}
