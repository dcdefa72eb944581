import pg from 'pg';
import { buildPrint } from '../../tests/support/factories';

const PER_INSTANCE = 8;

interface Created {
  id: number;
  accessionNumber: string;
}

/**
 * Issue 16's uniqueness check: `PER_INSTANCE` connections on each instance create valid
 * prints for `seconds`. Duplicates: accession numbers that appear in more than one 201
 * answer. Lost writes: 201 answers whose print the database does not hold afterwards (read
 * straight from PostgreSQL), plus non-2xx answers to these valid creates. Network errors
 * are counted apart.
 */
export async function concurrentCreates(
  instances: string[],
  headers: Record<string, string>,
  databaseUrl: string,
  seconds: number,
) {
  const body = JSON.stringify(buildPrint({ title: 'Concurrent create' }));
  const created: Created[] = [];
  let refused = 0;
  let errors = 0;
  const deadline = performance.now() + seconds * 1000;
  const worker = async (url: string) => {
    while (performance.now() < deadline) {
      try {
        const response = await fetch(`${url}/api/prints`, { method: 'POST', headers, body });
        const answer = (await response.json()) as Created;
        if (response.status === 201) created.push(answer);
        else refused += 1;
      } catch {
        errors += 1;
      }
    }
  };
  await Promise.all(
    instances.flatMap((url) => Array.from({ length: PER_INSTANCE }, () => worker(url))),
  );

  const seen = new Map<string, number>();
  for (const { accessionNumber } of created)
    seen.set(accessionNumber, (seen.get(accessionNumber) ?? 0) + 1);
  const duplicateAccessions = [...seen.values()].filter((count) => count > 1).length;

  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ id: number }>(
      'SELECT id FROM prints WHERE id = ANY($1::int[]) AND deleted_at IS NULL',
      [created.map(({ id }) => id)],
    );
    const held = new Set(rows.map(({ id }) => Number(id)));
    const missing = created.filter(({ id }) => !held.has(id)).length;
    return {
      connectionsPerInstance: PER_INSTANCE,
      instances: instances.length,
      seconds,
      answered201: created.length,
      duplicateAccessions,
      missingAfter201: missing,
      non2xx: refused,
      networkErrors: errors,
      lostWrites: missing + refused,
    };
  } finally {
    await client.end();
  }
}
