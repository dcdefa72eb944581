import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sqlite3 from 'sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { signInOver, startChildServer, type ChildServer } from '../../support/child-server';

const dir = mkdtempSync(join(tmpdir(), 'printwarden-crash-'));
const file = join(dir, 'crash.sqlite');
const env = {
  DATABASE_URL: `sqlite:${file}`,
  DATA_DIR: dir,
  UPLOADS_DIR: join(dir, 'uploads'),
  SESSION_SECRET: 'crash-test',
  DEMO: '1',
};
let server: ChildServer | undefined;
afterAll(async () => {
  await server?.kill();
  rmSync(dir, { recursive: true, force: true });
});

type Answered =
  { kind: 'create'; id: number; title: string } | { kind: 'edit'; id: number; description: string };

const BURST = 40;

/** Fires creates and edits at once; SIGKILLs the server once `killAfter` have been answered. */
async function burstAndKill(
  round: number,
  editIds: number[],
  killAfter: number,
): Promise<Answered[]> {
  const headers = await signInOver(server!.url, 'archivist@printwarden.test', 'printwarden-demo');
  const answered: Answered[] = [];
  let killing: Promise<void> | undefined;
  const note = (entry: Answered) => {
    answered.push(entry);
    if (answered.length >= killAfter) killing ??= server!.kill();
  };
  const requests = Array.from({ length: BURST }, async (_, n) => {
    if (n % 2 === 0 || editIds.length === 0) {
      const title = `Crash ${round}-${n}`;
      const response = await fetch(`${server!.url}/api/prints`, {
        method: 'POST',
        headers,
        body: JSON.stringify(buildPrint({ title })),
      });
      if (response.status === 201)
        note({ kind: 'create', id: ((await response.json()) as { id: number }).id, title });
    } else {
      const id = editIds[n % editIds.length]!;
      const description = `Edited in round ${round}, request ${n}`;
      const response = await fetch(`${server!.url}/api/prints/${id}`, {
        method: 'PATCH',
        headers,
        body: JSON.stringify({ description }),
      });
      if (response.status === 200) note({ kind: 'edit', id, description });
    }
  });
  await Promise.allSettled(requests);
  await (killing ?? server!.kill());
  return answered;
}

function query<T>(db: sqlite3.Database, sql: string, params: unknown[] = []): Promise<T[]> {
  return new Promise((resolve, reject) =>
    db.all(sql, params, (error, rows) => (error ? reject(error) : resolve(rows as T[]))),
  );
}

/** Reads the database file the killed server left: every answered write whole, nothing half. */
async function checkDatabase(answered: Answered[]): Promise<void> {
  const db = new sqlite3.Database(file);
  try {
    const [integrity] = await query<{ integrity_check: string }>(db, 'PRAGMA integrity_check');
    expect(integrity?.integrity_check).toBe('ok');
    // Whole or absent: every burst print, answered or not, has its six steps and its audit event.
    const burstPrints = await query<{ id: number; title: string; steps: number; audits: number }>(
      db,
      `SELECT p.id, p.title,
         (SELECT COUNT(*) FROM processing_steps s WHERE s.print_id = p.id) AS steps,
         (SELECT COUNT(*) FROM audit_events a WHERE a.entity = 'print' AND a.entity_id = p.id AND a.action = 'create') AS audits
       FROM prints p WHERE p.title LIKE 'Crash %'`,
    );
    for (const print of burstPrints)
      expect(print, 'half-written print').toMatchObject({ steps: 6, audits: 1 });
    const byId = new Map(burstPrints.map((print) => [print.id, print]));
    for (const entry of answered) {
      if (entry.kind === 'create') {
        expect(byId.get(entry.id)?.title, `answered create ${entry.title} lost`).toBe(entry.title);
        continue;
      }
      const audits = await query<{ after: string }>(
        db,
        "SELECT after FROM audit_events WHERE entity = 'print' AND entity_id = ? AND action = 'update'",
        [entry.id],
      );
      const edited = audits.some(
        (a) => (JSON.parse(a.after) as { description?: string }).description === entry.description,
      );
      expect(edited, `answered edit of print ${entry.id} has no audit event`).toBe(true);
    }
    // Each edited print shows the last answered edit to it or a later one of the same burst.
    const lastEdit = new Map<number, string>();
    for (const entry of answered)
      if (entry.kind === 'edit') lastEdit.set(entry.id, entry.description);
    for (const [id, description] of lastEdit) {
      const [row] = await query<{ description: string }>(
        db,
        'SELECT description FROM prints WHERE id = ?',
        [id],
      );
      const round = description.split(',')[0];
      expect(row?.description.startsWith(round!), `print ${id} lost its edit`).toBe(true);
    }
  } finally {
    await new Promise((resolve) => db.close(resolve));
  }
}

describe('nothing lost when the server is killed mid-burst', () => {
  it(
    'keeps every answered create and edit whole, at several kill moments',
    { timeout: 120_000 },
    async () => {
      const editIds = Array.from({ length: 20 }, (_, i) => i + 1);
      const cut: boolean[] = [];
      // Kill after the first answer, a quarter, and most of the burst; each restart also
      // proves the server comes back up on what the last kill left.
      for (const [round, killAfter] of [1, 10, 30].entries()) {
        server = await startChildServer(env);
        const answered = await burstAndKill(round, editIds, killAfter);
        expect(answered.length).toBeGreaterThanOrEqual(1);
        cut.push(answered.length < BURST);
        await checkDatabase(answered);
      }
      expect(cut, 'the kill never landed mid-burst').toContain(true);
    },
  );
});
