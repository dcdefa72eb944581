import { existsSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import type { Request, Response } from 'express';
import { roleCan, type Role } from '../../shared/domain/roles';
import type { User } from '../models';
import { ROUTE_PRELOADS } from './route-preloads';

/** route name → built chunks of its page, as the Vite plugin `routePreloads` wrote them. */
type ChunkList = Record<string, string[]>;

const escape = (text: string) => text.replace(/&/g, '&amp;').replace(/"/g, '&quot;');

/**
 * The links for the page at `url`: its code (modulepreload) always, its first API answers
 * (preload as fetch, taken up by the page's first requests as `/api/session`'s is) only for
 * a signed-in person, whose requests they are, and only those the person's role may read.
 */
export function preloadLinks(url: URL, chunks: ChunkList, role: Role | null): string[] {
  for (const route of ROUTE_PRELOADS) {
    const match = url.pathname.match(route.pattern);
    if (!match) continue;
    const code = (chunks[route.name] ?? []).map(
      (file) => `<link rel="modulepreload" crossorigin href="${escape(file)}">`,
    );
    const api =
      role && route.api
        ? route.api(match, url.searchParams, (ability) => roleCan(role, ability))
        : [];
    const data = api.map(
      (address) =>
        `<link rel="preload" href="${escape(address)}" as="fetch" crossorigin="anonymous">`,
    );
    return [...data, ...code];
  }
  return [];
}

/**
 * Answers every non-API path with the built index page, with the preloads of the page it
 * opens added at the end of its head. Read again when the build changes.
 */
export function indexPage(clientDir: string): (req: Request, res: Response) => void {
  const indexFile = join(clientDir, 'index.html');
  const chunksFile = join(clientDir, 'route-preloads.json');
  let cached: { mtimeMs: number; html: string; chunks: ChunkList } | undefined;
  const load = () => {
    const mtimeMs = statSync(indexFile).mtimeMs;
    if (cached?.mtimeMs !== mtimeMs) {
      const chunks = existsSync(chunksFile)
        ? (JSON.parse(readFileSync(chunksFile, 'utf8')) as ChunkList)
        : {};
      cached = { mtimeMs, html: readFileSync(indexFile, 'utf8'), chunks };
    }
    return cached;
  };
  return (req, res) => {
    const { html, chunks } = load();
    const url = new URL(req.originalUrl, 'http://host');
    const links = preloadLinks(url, chunks, (req.user as User | undefined)?.role ?? null);
    res.set('Cache-Control', 'no-cache');
    res
      .type('html')
      .send(links.length ? html.replace('</head>', `${links.join('')}</head>`) : html);
  };
}
