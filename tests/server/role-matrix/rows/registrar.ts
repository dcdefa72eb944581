import type { MatrixRow } from '../matrix-row';

const curatorUp = ['curator', 'conservator', 'archivist', 'admin'] as const;
const writers = ['archivist', 'admin'] as const;

/** The registrar's list of sources (contract: archivist+ write, curator+ read). */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/sources', allowed: curatorUp },
  {
    method: 'post',
    path: '/api/sources',
    allowed: writers,
    body: { name: 'Matrix donor', kind: 'person' },
  },
  { method: 'get', path: '/api/sources/:id', allowed: curatorUp },
  { method: 'patch', path: '/api/sources/:id', allowed: writers, body: { name: 'Matrix donors' } },
];
