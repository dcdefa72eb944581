import pg from 'pg';
import type { Sequelize } from 'sequelize';
import type { Logger } from '../logging/logger';
import { publishAccountsChanged } from './accounts-changed';
import { CHANNELS } from './dialect/postgres';
import { ownChanges, publishChange, type PrintChangeKind } from './prints-changed';
import { readJson } from '../repositories/decode-columns';
import { selectRows } from './select-rows';

/** A missed notification (a dropped listening connection) is made good this often. */
const POLL_MS = 5_000;
/** Feed rows read per step while catching up. */
const STEP = 500;

/**
 * Keeps this instance's subscribers (the search index, caches) current with changes written
 * through other instances on the same PostgreSQL database. Changes to people and sessions
 * come as notices alone (`accounts-changed.ts`): they only empty caches. Each committed write leaves one
 * row in `print_changes` and a NOTIFY; the follower reads the rows after the last it saw, in
 * id order, and publishes each one it did not write itself. Writers hold one lock across
 * instances (the dialect's `lockForWrite`), so feed rows commit in id order and none is
 * skipped. The listening connection is a plain pg client: Sequelize's pool lends
 * connections per query and cannot hold one open for notifications.
 */
export class ChangeFollower {
  private client: pg.Client | null = null;
  private timer: NodeJS.Timeout | null = null;
  private lastSeen = 0;
  private running: Promise<void> = Promise.resolve();
  private again = false;
  private stopped = false;

  constructor(
    private readonly sequelize: Sequelize,
    private readonly url: string,
    private readonly logger: Logger,
  ) {}

  /** Starts after the newest row: what came before is in the database the index reads. */
  async start(): Promise<void> {
    const [row] = await selectRows<{ last: number | null }>(
      this.sequelize,
      'SELECT MAX(id) AS last FROM print_changes',
      [],
    );
    this.lastSeen = row?.last ?? 0;
    await this.listen();
    this.timer = setInterval(() => this.wake(), POLL_MS);
    this.timer.unref();
  }

  private async listen(): Promise<void> {
    const client = new pg.Client({ connectionString: this.url });
    client.on('notification', (message) => {
      if (message.channel === CHANNELS.accounts) {
        publishAccountsChanged(this.sequelize, message.payload || undefined);
      } else this.wake();
    });
    client.on('error', (error) => {
      // The poll keeps the index current until the next start; say so once.
      this.logger.warn({ err: error }, 'The change feed listener lost its connection.');
      this.client = null;
    });
    await client.connect();
    await client.query(`LISTEN ${CHANNELS.prints}`);
    await client.query(`LISTEN ${CHANNELS.accounts}`);
    this.client = client;
  }

  /** Reads the feed now, or once more after the read in progress. */
  wake(): void {
    if (this.stopped) return;
    this.again = true;
    this.running = this.running.then(async () => {
      while (this.again && !this.stopped) {
        this.again = false;
        await this.catchUp().catch((error: unknown) => {
          this.logger.warn(
            { err: error },
            'Reading the change feed failed; retrying at the next poll.',
          );
        });
      }
    });
  }

  /** Resolves once every row committed before the call has been published. */
  async caughtUp(): Promise<void> {
    this.wake();
    await this.running;
  }

  private async catchUp(): Promise<void> {
    const own = ownChanges(this.sequelize);
    for (;;) {
      const rows = await selectRows<{ id: number; print_ids: unknown; what: unknown }>(
        this.sequelize,
        'SELECT id, print_ids, what FROM print_changes WHERE id > ? ORDER BY id LIMIT ?',
        [this.lastSeen, STEP],
      );
      for (const row of rows) {
        this.lastSeen = row.id;
        if (own.delete(row.id)) continue;
        await publishChange(this.sequelize, {
          printIds: readJson<number[]>(row.print_ids),
          what: readJson<PrintChangeKind[]>(row.what),
        });
      }
      if (rows.length < STEP) return;
    }
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    await this.running;
    await this.client?.end().catch(() => undefined);
    this.client = null;
  }
}
