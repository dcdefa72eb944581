import { isAbsolute, resolve } from 'node:path';

export type DatabaseTarget =
  { dialect: 'sqlite'; storage: string } | { dialect: 'postgres'; url: string };

/**
 * `sqlite:data/x.sqlite` is relative to the working directory; `sqlite:/abs/x.sqlite` and
 * `sqlite:///abs/x.sqlite` are absolute; `sqlite::memory:` stays in memory.
 */
export function parseDatabaseUrl(url: string, cwd = process.cwd()): DatabaseTarget {
  if (url.startsWith('postgres://') || url.startsWith('postgresql://')) {
    return { dialect: 'postgres', url };
  }
  if (!url.startsWith('sqlite:')) {
    throw new Error(`DATABASE_URL must start with sqlite: or postgres:// (got "${url}")`);
  }
  let path = url.slice('sqlite:'.length);
  if (path === ':memory:') return { dialect: 'sqlite', storage: ':memory:' };
  if (path.startsWith('//')) path = path.slice(2);
  if (path === '') throw new Error('DATABASE_URL names no sqlite file');
  return { dialect: 'sqlite', storage: isAbsolute(path) ? path : resolve(cwd, path) };
}
