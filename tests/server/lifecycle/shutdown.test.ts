import { mkdtempSync, rmSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { signInOver, startChildServer, type ChildServer } from '../../support/child-server';

const dir = mkdtempSync(join(tmpdir(), 'printwarden-shutdown-'));
let server: ChildServer | undefined;
afterAll(async () => {
  if (server && server.child.exitCode === null) await server.kill();
  rmSync(dir, { recursive: true, force: true });
});

/**
 * Sends a multipart upload in two halves and resolves with the answer. The second half
 * goes only when `between` resolves, so the test can stop the server mid-upload.
 */
function uploadInTwoHalves(
  url: string,
  headers: Record<string, string>,
  printId: number,
  file: Buffer,
  between: () => Promise<void>,
): Promise<{ status: number; body: string }> {
  const boundary = '----printwarden-shutdown-test';
  const body = Buffer.concat([
    Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="view"\r\n\r\nrecto\r\n` +
        `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="scan.jpg"\r\n` +
        'Content-Type: image/jpeg\r\n\r\n',
    ),
    file,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  ]);
  const half = Math.floor(body.length / 2);
  return new Promise((resolve, reject) => {
    const request = httpRequest(`${url}/api/prints/${printId}/assets`, {
      method: 'POST',
      headers: {
        cookie: headers.cookie!,
        'x-csrf-token': headers['x-csrf-token']!,
        'content-type': `multipart/form-data; boundary=${boundary}`,
        'content-length': String(body.length),
        // The server answers 100 Continue once it has read the headers: from then on the
        // request is in flight on its side, not a connection still to be accepted.
        expect: '100-continue',
      },
    });
    request.on('response', (response) => {
      let text = '';
      response.on('data', (chunk: Buffer) => (text += chunk.toString()));
      response.on('end', () => resolve({ status: response.statusCode ?? 0, body: text }));
    });
    request.on('error', reject);
    request.on('continue', () => {
      request.write(body.subarray(0, half));
      void between().then(() => request.end(body.subarray(half)));
    });
    request.flushHeaders();
  });
}

describe('SIGTERM', () => {
  it(
    'finishes an upload in flight, stops background work and exits 0',
    { timeout: 90_000 },
    async () => {
      // The demo seed attaches its images in the background: work that is running when the
      // stop arrives (before, every stop ended in SQLITE_MISUSE: Database is closed).
      server = await startChildServer({
        DATABASE_URL: `sqlite:${join(dir, 'db.sqlite')}`,
        DATA_DIR: dir,
        UPLOADS_DIR: join(dir, 'uploads'),
        SESSION_SECRET: 'shutdown-test',
        DEMO: '1',
        PASSWORD_COST: '4',
      });
      const headers = await signInOver(
        server.url,
        'archivist@printwarden.test',
        'printwarden-demo',
      );
      const created = await fetch(`${server.url}/api/prints`, {
        method: 'POST',
        headers,
        body: JSON.stringify(buildPrint({ title: 'Uploaded while stopping' })),
      });
      expect(created.status).toBe(201);
      const { id } = (await created.json()) as { id: number };
      const running = server;

      const answer = await uploadInTwoHalves(
        running.url,
        headers,
        id,
        await buildJpeg(1600, 1200),
        async () => {
          running.child.kill('SIGTERM');
          // The stop has begun once the server says so; only then send the rest.
          await expect
            .poll(() => running.output.some((line) => line.includes('Stopping')), {
              timeout: 10_000,
            })
            .toBe(true);
        },
      );

      expect(answer.status, answer.body).toBe(201);
      expect(JSON.parse(answer.body)).toMatchObject({ sha256: expect.any(String) });
      expect(await running.exited).toBe(0);
      const log = running.output.join('\n');
      expect(log).not.toMatch(/SQLITE_MISUSE|Database is closed|Unhandled|uncaught/i);
      // No new connection is taken once it has stopped.
      await expect(fetch(`${running.url}/api/health`)).rejects.toThrow();
    },
  );
});
