import { mkdtempSync, rmSync } from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import express, { type Express } from 'express';
import { createApp } from '../server/app';
import { hashPassword } from '../server/auth/password';
import { bootstrap } from '../server/bootstrap';
import { loadConfig } from '../server/config';
import { User } from '../server/models';
import { fillPrints } from './fill';

/**
 * The servers under test, in a process of their own so the load generator does not share
 * their CPU: Printwarden on a filled database, and a bare Express app as the floor.
 * Prints one JSON line with the addresses, then serves until killed.
 */
const PRINTS = Number(process.env.BENCH_PRINTS ?? 10_000);

function listen(app: Express): Promise<Server> {
  return new Promise((resolve) => {
    const server = app.listen(0, '127.0.0.1', () => resolve(server));
  });
}
const url = (server: Server) => `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

function bareApp(): Express {
  const app = express();
  app.use(express.json());
  app.get('/items', (_req, res) => {
    res.json({ items: [], total: 0 });
  });
  app.post('/items', (req, res) => {
    res.status(201).json({ id: 1, ...req.body });
  });
  return app;
}

const dir = mkdtempSync(join(tmpdir(), 'printwarden-bench-'));
const ctx = await bootstrap(
  loadConfig({
    DATABASE_URL: `sqlite:${join(dir, 'bench.sqlite')}`,
    DATA_DIR: dir,
    UPLOADS_DIR: join(dir, 'uploads'),
    SESSION_SECRET: 'bench',
    DEMO: '0',
  }),
);
await fillPrints(ctx.sequelize, PRINTS);
await User.create({
  email: 'bench@printwarden.test',
  name: 'Bench',
  role: 'archivist',
  passwordHash: await hashPassword('bench-password-123', 4),
});
const api = await listen(createApp(ctx).app);
const bare = await listen(bareApp());
process.stdout.write(`${JSON.stringify({ api: url(api), bare: url(bare), prints: PRINTS })}\n`);

process.on('SIGTERM', () => {
  rmSync(dir, { recursive: true, force: true });
  process.exit(0);
});
