import type { MatrixRow } from '../matrix-row';

const everyone = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;
const curatorUp = ['curator', 'conservator', 'archivist', 'admin'] as const;
const writers = ['archivist', 'admin'] as const;

/** Prints, the checklist export, the reference lists and the audit trail (contract). */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/prints', allowed: everyone },
  { method: 'post', path: '/api/prints', allowed: writers },
  { method: 'get', path: '/api/prints/:id', allowed: everyone },
  {
    method: 'patch',
    path: '/api/prints/:id',
    allowed: curatorUp,
    note: 'curator: curatorial fields',
  },
  { method: 'delete', path: '/api/prints/:id', allowed: writers },
  { method: 'post', path: '/api/prints/:id/restore', allowed: writers },
  { method: 'get', path: '/api/prints.csv', allowed: curatorUp },
  ...(['papers', 'negatives', 'solution-batches'] as const).flatMap((list): MatrixRow[] => [
    { method: 'get', path: `/api/${list}`, allowed: everyone },
    { method: 'post', path: `/api/${list}`, allowed: writers },
    { method: 'patch', path: `/api/${list}/:id`, allowed: writers },
    { method: 'delete', path: `/api/${list}/:id`, allowed: writers },
  ]),
  {
    method: 'get',
    path: '/api/locations',
    allowed: curatorUp,
    note: 'places are hidden from viewers',
  },
  { method: 'post', path: '/api/locations', allowed: writers },
  { method: 'patch', path: '/api/locations/:id', allowed: writers },
  { method: 'delete', path: '/api/locations/:id', allowed: writers },
  { method: 'get', path: '/api/audit', allowed: writers },
];
