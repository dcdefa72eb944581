import type { MatrixRow } from '../matrix-row';

const EVERYONE = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;
const WRITERS = ['archivist', 'admin'] as const;

/** Images: uploads, files, deep zoom, manifest, colour samples, fixity. */
export const rows: MatrixRow[] = [
  { method: 'post', path: '/api/prints/:id/assets', allowed: WRITERS },
  { method: 'get', path: '/api/prints/:id/manifest.json', allowed: EVERYONE },
  {
    method: 'get',
    path: '/api/assets/:id/:size',
    allowed: EVERYONE,
    note: '`original` only for curator, conservator, archivist, admin (403 for viewers)',
  },
  {
    method: 'post',
    path: '/api/assets/:id/samples',
    allowed: ['conservator', 'archivist', 'admin'],
  },
  { method: 'delete', path: '/api/assets/:id', allowed: WRITERS },
  { method: 'get', path: '/api/iiif/:id', allowed: EVERYONE },
  {
    method: 'get',
    path: '/api/iiif/:id/info.json',
    allowed: EVERYONE,
    note: 'viewers see the size capped at web size',
  },
  {
    method: 'get',
    path: '/api/iiif/:id/:region/:size/:rotation/:file',
    allowed: EVERYONE,
    note: 'tiles finer than web size: 403 for viewers',
  },
  { method: 'post', path: '/api/fixity-checks', allowed: ['admin'] },
  { method: 'get', path: '/api/fixity-checks', allowed: ['admin'] },
  { method: 'get', path: '/api/fixity-checks/:id', allowed: ['admin'] },
];
