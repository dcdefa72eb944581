import { ROLES } from '../../../../shared/domain/roles';
import type { MatrixRow } from '../matrix-row';

/** The start page (issue 20): every signed-in role, each its own summary. */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/overview', allowed: ROLES },
  // Marking tone status changes seen: those who log tone checks.
  { method: 'post', path: '/api/overview/seen', allowed: ['conservator', 'admin'] },
];
