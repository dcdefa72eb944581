import { spawn, type ChildProcess } from 'node:child_process';
import { createInterface } from 'node:readline';
import { buildState } from '../../scripts/build-freshness.mjs';

export interface ChildServer {
  url: string;
  child: ChildProcess;
  /** Every line the server wrote, stdout and stderr, in arrival order. */
  output: string[];
  /** The exit code (or the signal's name) once the process has ended. */
  exited: Promise<number | string>;
  kill: () => Promise<void>;
}

/** `source`: the TypeScript through tsx; `compiled`: the built `dist/server` under plain node. */
type Entry = 'source' | 'compiled';

/**
 * Without a choice, the compiled files when the build is newer than every source (as in
 * `npm test`, which builds first: plain node starts in a third of tsx's time), else tsx.
 */
const defaultEntry = (): Entry => (buildState() === 'fresh' ? 'compiled' : 'source');

/** Node's arguments to run `server/<script>.ts` (or its compiled `.js`). */
function nodeArgs(script: string, entry: Entry = defaultEntry()): string[] {
  return entry === 'compiled'
    ? [`dist/server/${script}.js`]
    : ['--import', 'tsx', `server/${script}.ts`];
}

/**
 * Starts the real server in a child process and waits for its port: `server/index.ts`
 * through tsx or the compiled `dist/server/index.js` under plain node (see `defaultEntry`).
 */
export async function startChildServer(
  env: Record<string, string>,
  options: { entry?: Entry } = {},
): Promise<ChildServer> {
  const child = spawn(process.execPath, nodeArgs('index', options.entry), {
    env: { NODE_ENV: 'test', ...process.env, PORT: '0', LOG_LEVEL: 'info', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  createInterface({ input: child.stderr! }).on('line', (line) => output.push(line));
  const exited = new Promise<number | string>((resolve) =>
    child.once('exit', (code, signal) => resolve(code ?? signal ?? 'unknown')),
  );
  const port = await new Promise<number>((resolve, reject) => {
    createInterface({ input: child.stdout! }).on('line', (line) => {
      output.push(line);
      const port = parsePort(line);
      if (port) resolve(port);
    });
    void exited.then((code) =>
      reject(new Error(`server exited early with ${code}:\n${output.join('\n')}`)),
    );
  });
  return {
    url: `http://127.0.0.1:${port}`,
    child,
    output,
    exited,
    kill: async () => {
      child.kill('SIGKILL');
      await exited;
    },
  };
}

/**
 * Runs `npm run create-admin`'s script with these arguments, `input` on standard input and
 * `env` over this process's environment; resolves when it ends.
 */
export function runCreateAdmin(
  args: string[],
  input: string,
  env: Record<string, string>,
  options: { entry?: Entry } = {},
): Promise<{ code: number | null; stdout: string; stderr: string }> {
  const child = spawn(
    process.execPath,
    [...nodeArgs('scripts/create-admin', options.entry), ...args],
    {
      env: { ...process.env, ...env },
      stdio: ['pipe', 'pipe', 'pipe'],
    },
  );
  let stdout = '';
  let stderr = '';
  child.stdout.on('data', (chunk: Buffer) => (stdout += chunk.toString()));
  child.stderr.on('data', (chunk: Buffer) => (stderr += chunk.toString()));
  child.stdin.end(input);
  return new Promise((resolve) => child.on('close', (code) => resolve({ code, stdout, stderr })));
}

function parsePort(line: string): number | undefined {
  try {
    return (JSON.parse(line) as { port?: number }).port;
  } catch {
    return undefined;
  }
}

/** Signs in over HTTP; returns the headers later requests need. */
export async function signInOver(url: string, email: string, password: string) {
  const response = await fetch(`${url}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  if (response.status !== 200) throw new Error(`sign-in failed: ${response.status}`);
  const cookie = response.headers.get('set-cookie')!.split(';')[0]!;
  const { csrfToken } = (await response.json()) as { csrfToken: string };
  return { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' };
}
