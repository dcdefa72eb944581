import type { MatrixRow } from '../matrix-row';

const CURATOR_UP = ['curator', 'conservator', 'archivist', 'admin'] as const;

/** Saved searches, checklists and the search index (issue 7). */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/saved-searches', allowed: CURATOR_UP, note: 'own only' },
  { method: 'post', path: '/api/saved-searches', allowed: CURATOR_UP },
  { method: 'delete', path: '/api/saved-searches/:id', allowed: CURATOR_UP, note: 'own only' },
  { method: 'get', path: '/api/checklists', allowed: CURATOR_UP },
  { method: 'post', path: '/api/checklists', allowed: CURATOR_UP },
  { method: 'get', path: '/api/checklists/:id.csv', allowed: CURATOR_UP },
  { method: 'get', path: '/api/checklists/:id', allowed: CURATOR_UP },
  { method: 'patch', path: '/api/checklists/:id', allowed: CURATOR_UP },
  { method: 'delete', path: '/api/checklists/:id', allowed: CURATOR_UP },
  { method: 'get', path: '/api/search-index', allowed: ['conservator', 'admin'] },
  { method: 'post', path: '/api/search-index/rebuild', allowed: ['admin'] },
];
