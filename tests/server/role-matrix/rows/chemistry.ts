import type { MatrixRow } from '../matrix-row';

const everyone = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;

/** The chemistry area: solution maker, batch pages and the printing log. */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/chemistry/solution', allowed: everyone },
  { method: 'get', path: '/api/solution-batches/:id', allowed: everyone },
  { method: 'get', path: '/api/negatives/:id/printing-log', allowed: everyone },
];
