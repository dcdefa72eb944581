import type { MatrixRow } from '../matrix-row';

const everyone = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;
const conservators = ['conservator', 'admin'] as const;

/** Storage environment: readings, a place's environment, places' alerts (issue 17). */
export const rows: MatrixRow[] = [
  { method: 'post', path: '/api/locations/:id/readings', allowed: conservators },
  { method: 'get', path: '/api/locations/:id/environment', allowed: everyone },
  { method: 'get', path: '/api/environment-alerts', allowed: conservators },
  { method: 'post', path: '/api/environment-alerts/:id/acknowledgement', allowed: conservators },
];
