import { spawn, type ChildProcess } from 'node:child_process';
import { createInterface } from 'node:readline';

export interface ChildServer {
  url: string;
  child: ChildProcess;
  kill: () => Promise<void>;
}

/** Starts the real server (`server/index.ts`) in a child process and waits for its port. */
export async function startChildServer(env: Record<string, string>): Promise<ChildServer> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    env: { ...process.env, ...env, PORT: '0', LOG_LEVEL: 'info', NODE_ENV: 'test' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const port = await new Promise<number>((resolve, reject) => {
    const lines = createInterface({ input: child.stdout! });
    lines.on('line', (line) => {
      const entry = JSON.parse(line) as { port?: number };
      if (entry.port) resolve(entry.port);
    });
    child.once('exit', (code) => reject(new Error(`server exited early with ${code}`)));
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  return {
    url: `http://127.0.0.1:${port}`,
    child,
    kill: async () => {
      child.kill('SIGKILL');
      await exited;
    },
  };
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
