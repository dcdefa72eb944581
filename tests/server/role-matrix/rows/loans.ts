import type { MatrixRow } from '../matrix-row';

const EVERYONE = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;
const CURATOR_UP = ['curator', 'conservator', 'archivist', 'admin'] as const;

/** Loans and exhibitions, and a print's light dose (issue 18). */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/loans', allowed: EVERYONE },
  { method: 'post', path: '/api/loans', allowed: CURATOR_UP },
  { method: 'get', path: '/api/loans/:id', allowed: EVERYONE },
  { method: 'patch', path: '/api/loans/:id', allowed: CURATOR_UP },
  { method: 'get', path: '/api/loans/:id/report.pdf', allowed: CURATOR_UP },
  { method: 'get', path: '/api/prints/:id/light', allowed: EVERYONE },
];
