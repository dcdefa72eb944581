import { readFile, stat } from 'node:fs/promises';
import { extname, join, normalize, sep } from 'node:path';
import { gzipSync } from 'node:zlib';
import type { NextFunction, Request, Response } from 'express';

const TYPES: Record<string, string> = {
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.json': 'application/json; charset=utf-8',
};

/**
 * Serves the built client's `assets/` gzipped to browsers that accept it, compressing each
 * file once (Vite names them by content, so they never change: cached for a year). Without
 * it a phone fetched the scripts at three times their compressed size.
 */
export function compressedAssets(clientDir: string) {
  const root = join(clientDir, 'assets');
  const cache = new Map<string, { mtimeMs: number; body: Buffer }>();
  return async (req: Request, res: Response, next: NextFunction) => {
    const type = TYPES[extname(req.path)];
    if (
      (req.method !== 'GET' && req.method !== 'HEAD') ||
      !req.path.startsWith('/assets/') ||
      !type ||
      !/\bgzip\b/.test(req.get('accept-encoding') ?? '')
    ) {
      return next();
    }
    const file = normalize(join(clientDir, req.path));
    if (!file.startsWith(root + sep)) return next();
    try {
      const info = await stat(file);
      let entry = cache.get(file);
      if (!entry || entry.mtimeMs !== info.mtimeMs) {
        entry = { mtimeMs: info.mtimeMs, body: gzipSync(await readFile(file), { level: 9 }) };
        cache.set(file, entry);
      }
      res.set({
        'Content-Type': type,
        'Content-Encoding': 'gzip',
        'Content-Length': String(entry.body.length),
        'Cache-Control': 'public, max-age=31536000, immutable',
        Vary: 'Accept-Encoding',
      });
      if (req.method === 'HEAD') return res.end();
      res.end(entry.body);
    } catch {
      next();
    }
  };
}
