import type { MatrixRow } from '../matrix-row';

/** People and e-mail. */
export const rows: MatrixRow[] = [
  {
    method: 'get',
    path: '/api/outbox',
    allowed: ['admin'],
    note: 'only while the built-in mail server is in use (as in tests)',
  },
];
