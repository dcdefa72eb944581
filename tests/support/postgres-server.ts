import pg from 'pg';

/** One statement on a PostgreSQL server (CREATE and DROP DATABASE run outside a transaction). */
export async function runOnServer(server: string, sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: server });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/** The URL of database `name` on the server of `server`. */
export function databaseUrlOn(server: string, name: string): string {
  const url = new URL(server);
  url.pathname = `/${name}`;
  return url.toString();
}
