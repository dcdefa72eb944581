import { execFileSync } from 'node:child_process';
import { chownSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { databaseUrlOn, runOnServer } from '../tests/support/postgres-server';

/**
 * The PostgreSQL server a bench runs on: `BENCH_POSTGRES_URL` when set (a server URL whose
 * user may create databases), else a throwaway cluster started as `.ci/run` starts one —
 * Debian's newest `/usr/lib/postgresql/N/bin`, run as the `postgres` user (initdb refuses
 * root), on a free loopback port, fsync off, its folder removed by `stop`.
 */
export interface PostgresServer {
  url: string;
  stop: () => Promise<void>;
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer().listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
    server.once('error', reject);
  });
}

function newestPostgresBin(): string {
  const versions = execFileSync('sh', ['-c', 'ls -d /usr/lib/postgresql/*/bin | sort -V'])
    .toString()
    .trim()
    .split('\n')
    .filter(Boolean);
  const bin = versions.at(-1);
  if (!bin) throw new Error('No PostgreSQL under /usr/lib/postgresql: apt-get install postgresql');
  return bin;
}

/** Root runs the cluster's tools as `postgres` (initdb refuses root); anyone else as self. */
const isRoot = process.getuid?.() === 0;
const asPostgres = (command: string) =>
  isRoot
    ? execFileSync('su', ['postgres', '-s', '/bin/sh', '-c', command], { stdio: 'ignore' })
    : execFileSync('sh', ['-c', command], { stdio: 'ignore' });

export async function startPostgresServer(): Promise<PostgresServer> {
  const given = process.env.BENCH_POSTGRES_URL;
  if (given) return { url: given, stop: async () => {} };
  const bin = newestPostgresBin();
  const dir = mkdtempSync(join(tmpdir(), 'printwarden-bench-pg-'));
  if (isRoot) chownSync(dir, Number(execFileSync('id', ['-u', 'postgres']).toString().trim()), -1);
  const port = await freePort();
  asPostgres(`'${bin}/initdb' -D '${dir}/db' -A trust -U postgres`);
  asPostgres(
    `'${bin}/pg_ctl' -D '${dir}/db' -l '${dir}/log' -w -o "-p ${port} -k '${dir}' ` +
      `-c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=300" start`,
  );
  const stopNow = () => {
    try {
      asPostgres(`'${bin}/pg_ctl' -D '${dir}/db' -m immediate stop`);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  };
  // Ctrl-C mid-run would otherwise leave the cluster running.
  const interrupted = () => {
    stopNow();
    process.exit(130);
  };
  process.once('SIGINT', interrupted);
  process.once('SIGTERM', interrupted);
  return {
    url: `postgres://postgres@127.0.0.1:${port}/postgres`,
    stop: async () => {
      process.off('SIGINT', interrupted);
      process.off('SIGTERM', interrupted);
      stopNow();
    },
  };
}

let made = 0;

/** A new, empty database on `server`; `drop` removes it (and ends its connections). */
export async function freshPostgresDatabase(server: string) {
  made += 1;
  const name = `printwarden_bench_${process.pid}_${made}_${Date.now().toString(36)}`;
  await runOnServer(server, `CREATE DATABASE ${name}`);
  return {
    url: databaseUrlOn(server, name),
    drop: () => runOnServer(server, `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`),
  };
}
