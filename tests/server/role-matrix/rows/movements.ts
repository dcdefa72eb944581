import type { MatrixRow } from '../matrix-row';

const CURATOR_UP = ['curator', 'conservator', 'archivist', 'admin'] as const;
const MOVERS = ['archivist', 'admin'] as const;

/** Movements and labels (issue 18): curators and above read places; archivists and admins move and print labels. */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/prints/:id/movements', allowed: CURATOR_UP },
  { method: 'post', path: '/api/prints/:id/movements', allowed: MOVERS },
  { method: 'post', path: '/api/movements', allowed: MOVERS },
  { method: 'get', path: '/api/locations/:id/holdings', allowed: CURATOR_UP },
  { method: 'get', path: '/api/locations/:id/labels.pdf', allowed: MOVERS },
  { method: 'get', path: '/api/prints/labels.pdf', allowed: MOVERS },
];
