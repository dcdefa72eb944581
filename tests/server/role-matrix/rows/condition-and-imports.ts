import type { MatrixRow } from '../matrix-row';

const EVERYONE = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;
const CURATOR_UP = ['curator', 'conservator', 'archivist', 'admin'] as const;
const CONDITION_WRITERS = ['conservator', 'admin'] as const;
const IMPORTERS = ['archivist', 'admin'] as const;

/** Condition reports, treatments, the report PDF, JSON-LD export and CSV imports. */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/prints/:id/condition-reports', allowed: CURATOR_UP },
  { method: 'post', path: '/api/prints/:id/condition-reports', allowed: CONDITION_WRITERS },
  { method: 'patch', path: '/api/condition-reports/:id', allowed: CONDITION_WRITERS },
  { method: 'delete', path: '/api/condition-reports/:id', allowed: CONDITION_WRITERS },
  { method: 'get', path: '/api/prints/:id/treatments', allowed: CURATOR_UP },
  { method: 'post', path: '/api/prints/:id/treatments', allowed: CONDITION_WRITERS },
  { method: 'get', path: '/api/prints/:id/report.pdf', allowed: CURATOR_UP },
  { method: 'get', path: '/api/prints/:id.jsonld', allowed: EVERYONE },
  { method: 'get', path: '/api/prints.jsonld', allowed: CURATOR_UP },
  { method: 'get', path: '/api/imports', allowed: IMPORTERS },
  { method: 'post', path: '/api/imports', allowed: IMPORTERS },
  { method: 'post', path: '/api/imports/inspection', allowed: IMPORTERS },
  { method: 'get', path: '/api/imports/:id', allowed: IMPORTERS },
  { method: 'get', path: '/api/imports/:id/failed.csv', allowed: IMPORTERS },
];
