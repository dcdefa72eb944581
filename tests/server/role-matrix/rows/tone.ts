import type { MatrixRow } from '../matrix-row';

const everyone = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;
const conservators = ['conservator', 'admin'] as const;

/** Tone watch, alerts and cohorts (settings: rows/settings.ts) (issue 8; cohorts from issue 9 §5). */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/prints/:id/tone-checks', allowed: everyone },
  { method: 'post', path: '/api/prints/:id/tone-checks', allowed: conservators },
  { method: 'get', path: '/api/prints/:id/tone-trend', allowed: everyone },
  { method: 'post', path: '/api/tone-checks/import', allowed: conservators },
  { method: 'patch', path: '/api/tone-checks/:id', allowed: conservators },
  { method: 'delete', path: '/api/tone-checks/:id', allowed: conservators },
  { method: 'get', path: '/api/tone-watch', allowed: conservators },
  { method: 'get', path: '/api/tone-rounds', allowed: conservators },
  { method: 'get', path: '/api/alerts', allowed: conservators },
  { method: 'post', path: '/api/alerts/:id/acknowledgement', allowed: conservators },
  { method: 'get', path: '/api/cohorts', allowed: everyone },
];
