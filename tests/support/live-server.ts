import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { inject } from 'vitest';
import { seedDemo } from '../../seeds/demo';
import { startTestApp, type TestApp } from './test-app';

/**
 * The real server over HTTP on a free port, serving the built client (`dist/client`) and the
 * demo collection, on a throwaway SQLite file.
 */
export async function startLiveServer(
  /** `images: true` also seeds the generated demo scans (off by default: quicker). */
  options: { images?: boolean } = {},
): Promise<{ url: string; stop: () => Promise<void>; test: TestApp }> {
  // The run's seeded template when there is one (browser tests); else seed here.
  const template = options.images ? undefined : inject('demoTemplate');
  const test = await startTestApp(
    { demo: true },
    { users: false, serveClient: true, databaseFrom: template },
  );
  if (!template) {
    const seeded = await seedDemo(test.ctx, {
      passwordCost: 4,
      images: options.images ? 'await' : false,
    });
    if (!seeded) throw new Error('demo seed did not run');
  }
  const { app } = test;
  const server: Server = await new Promise((resolve) => {
    const listening = app.listen(0, '127.0.0.1', () => resolve(listening));
  });
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    test,
    stop: async () => {
      await new Promise((resolve) => server.close(resolve));
      await test.close();
    },
  };
}
