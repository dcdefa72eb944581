import type { MatrixRow } from '../matrix-row';

/** The one settings store (tone watch, check intervals, chemistry): read conservator+, change admin. */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/settings', allowed: ['conservator', 'admin'] },
  {
    method: 'patch',
    path: '/api/settings',
    allowed: ['admin'],
    body: { chemistry: { sensitiserMlPer8x10: 2 } },
  },
];
