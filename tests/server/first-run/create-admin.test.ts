import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { runCreateAdmin, startChildServer } from '../../support/child-server';

const dir = mkdtempSync(join(tmpdir(), 'printwarden-create-admin-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Runs `npm run create-admin`'s script (compiled when the build is fresh) with this input. */
function createAdmin(database: string, args: string[], input: string) {
  return runCreateAdmin(args, input, {
    DATABASE_URL: `sqlite:${join(dir, database)}`,
    PASSWORD_COST: '4',
  });
}

async function signIn(url: string, email: string, password: string): Promise<number> {
  const response = await fetch(`${url}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  return response.status;
}

describe('npm run create-admin', { timeout: 60_000 }, () => {
  it('makes the first admin from arguments and a password on standard input', async () => {
    const made = await createAdmin(
      'scripted.sqlite',
      ['--email', 'Keeper@Example.org', '--name', 'Ana Keeper'],
      'a long enough password\n',
    );
    expect(made.code, made.stderr).toBe(0);
    expect(made.stdout).toMatch(/Admin keeper@example\.org created/);

    const again = await createAdmin(
      'scripted.sqlite',
      ['--email', 'second@example.org', '--name', 'Second'],
      'a long enough password\n',
    );
    expect(again.code).toBe(1);
    expect(again.stderr).toMatch(/active admin already exists \(keeper@example\.org\).*--force/);

    const forced = await createAdmin(
      'scripted.sqlite',
      ['--email', 'second@example.org', '--name', 'Second', '--force'],
      'another long password\n',
    );
    expect(forced.code, forced.stderr).toBe(0);
  });

  it('asks each value in turn, the password twice without echoing it', async () => {
    const made = await createAdmin(
      'asked.sqlite',
      [],
      [
        'asked@example.org',
        'Bo Asked',
        'too short',
        'too short',
        'a long enough password',
        'a different password!',
        'a long enough password',
        'a long enough password',
        '',
      ].join('\n'),
    );
    expect(made.code, made.stderr).toBe(0);
    expect(made.stdout).toMatch(/E-mail address: .*Name: .*Password/s);
    expect(made.stdout).not.toContain('a long enough password');
    expect(made.stderr).toMatch(/at least 12 characters/);
    expect(made.stderr).toMatch(/passwords differ/);
  });

  it('refuses a password under 12 characters given on standard input', async () => {
    const made = await createAdmin(
      'short.sqlite',
      ['--email', 'a@example.org', '--name', 'A'],
      'short\n',
    );
    expect(made.code).toBe(2);
    expect(made.stderr).toMatch(/Password: At least 12 characters/);
  });

  it('the admin it made signs in; a demo database warns at start and --remove-demo empties it', async () => {
    const database = join(dir, 'once-a-demo.sqlite');
    const env = {
      DATABASE_URL: `sqlite:${database}`,
      DATA_DIR: join(dir, 'demo-data'),
      UPLOADS_DIR: join(dir, 'demo-uploads'),
      SESSION_SECRET: 'first-run-test',
      PASSWORD_COST: '4',
    };
    const demo = await startChildServer({ ...env, DEMO: '1' });
    expect(await signIn(demo.url, 'admin@printwarden.test', 'printwarden-demo')).toBe(200);
    demo.child.kill('SIGTERM');
    expect(await demo.exited).toBe(0);

    const made = await createAdmin(
      'once-a-demo.sqlite',
      ['--email', 'real@example.org', '--name', 'Real Admin', '--force'],
      'the real admin password\n',
    );
    expect(made.code, made.stderr).toBe(0);

    const off = await startChildServer({ ...env, DEMO: '0' });
    try {
      const warnings = off.output.filter((line) => line.includes('demo account'));
      expect(warnings).toHaveLength(1);
      expect(warnings[0]).toMatch(/5 demo accounts .*npm run create-admin -- --remove-demo/);
      expect(await signIn(off.url, 'admin@printwarden.test', 'printwarden-demo')).toBe(401);
      expect(await signIn(off.url, 'real@example.org', 'the real admin password')).toBe(200);
    } finally {
      off.child.kill('SIGTERM');
      await off.exited;
    }

    const removed = await createAdmin('once-a-demo.sqlite', ['--remove-demo'], '');
    expect(removed.code).toBe(0);
    expect(removed.stdout).toMatch(/Demo accounts removed: \d deleted, \d retired/);
    const quiet = await startChildServer({ ...env, DEMO: '0' });
    quiet.child.kill('SIGTERM');
    await quiet.exited;
    expect(quiet.output.some((line) => line.includes('demo account'))).toBe(false);
  });
});
