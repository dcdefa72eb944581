import { readdirSync, readFileSync } from 'node:fs';
import pg from 'pg';

/**
 * Where the CPU goes during a run, from Linux's /proc: cores used (CPU seconds ÷ wall
 * seconds) by each named process, by the PostgreSQL server (its postmaster and every
 * backend under it), by this process (the load generator), and by the whole machine — the
 * machine's busy cores less those is other work. Without /proc (or a remote PostgreSQL) the
 * missing parts are left out.
 */
const TICKS_PER_SECOND = 100; // USER_HZ, `getconf CLK_TCK` on Linux

function stat(pid: number): { ppid: number; ticks: number } | null {
  try {
    const text = readFileSync(`/proc/${pid}/stat`, 'utf8');
    // Fields after the command name, which may hold spaces: state, ppid, … utime, stime.
    const fields = text.slice(text.lastIndexOf(')') + 2).split(' ');
    return { ppid: Number(fields[1]), ticks: Number(fields[11]) + Number(fields[12]) };
  } catch {
    return null;
  }
}

function treeTicks(root: number): number {
  let ticks = stat(root)?.ticks ?? 0;
  for (const name of readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    const child = stat(Number(name));
    if (child?.ppid === root) ticks += child.ticks;
  }
  return ticks;
}

function machineBusyTicks(): number {
  const [, ...values] = readFileSync('/proc/stat', 'utf8').split('\n')[0]!.trim().split(/\s+/);
  const numbers = values.map(Number);
  const idle = numbers[3]! + numbers[4]!;
  return numbers.reduce((sum, value) => sum + value, 0) - idle;
}

/** The postmaster's pid, from one backend's parent, if the server runs on this machine. */
export async function postmasterPid(databaseUrl: string): Promise<number | null> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ pid: number }>('SELECT pg_backend_pid() AS pid');
    return stat(rows[0]!.pid)?.ppid ?? null;
  } finally {
    await client.end();
  }
}

/** Runs `work` and says how many cores each part used meanwhile. */
export async function withCpuShare<T>(
  pids: Record<string, number>,
  postmaster: number | null,
  work: () => Promise<T>,
): Promise<{ result: T; coresUsed: Record<string, number> }> {
  const counters = () => ({
    ...Object.fromEntries(Object.entries(pids).map(([name, pid]) => [name, stat(pid)?.ticks])),
    postgres: postmaster === null ? undefined : treeTicks(postmaster),
    machine: machineBusyTicks() / TICKS_PER_SECOND, // already summed over every core
  });
  const before = counters();
  const ownBefore = process.cpuUsage();
  const started = performance.now();
  const result = await work();
  const seconds = (performance.now() - started) / 1000;
  const own = process.cpuUsage(ownBefore);
  const after = counters();
  const cores = (cpuSeconds: number) => Math.round((cpuSeconds / seconds) * 100) / 100;
  const coresUsed: Record<string, number> = {};
  for (const name of Object.keys(after) as Array<keyof typeof after>) {
    const [b, a] = [before[name], after[name]];
    if (a === undefined || b === undefined) continue;
    coresUsed[name] = cores(name === 'machine' ? a - b : (a - b) / TICKS_PER_SECOND);
  }
  coresUsed.loadGenerator = cores((own.user + own.system) / 1e6);
  return { result, coresUsed };
}
