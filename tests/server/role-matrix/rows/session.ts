import type { MatrixRow } from '../matrix-row';

const everyone = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;

/** Health, the demo accounts list, signing in and out (contract). */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/health', allowed: 'anyone' },
  { method: 'get', path: '/api/demo', allowed: 'anyone' },
  { method: 'post', path: '/api/session', allowed: 'anyone' },
  { method: 'get', path: '/api/session', allowed: everyone },
  { method: 'delete', path: '/api/session', allowed: everyone },
];
