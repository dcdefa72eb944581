import type { MatrixRow } from '../matrix-row';

const everyone = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;
const admin = ['admin'] as const;
/** A well-formed token that opens nothing: the routes answer 404, never 401/403. */
const unknownToken = { token: 'x'.repeat(43) };

/** People, invitations, password resets and the outbox (contract). */
export const rows: MatrixRow[] = [
  { method: 'get', path: '/api/users', allowed: admin },
  { method: 'patch', path: '/api/users/:id', allowed: admin },
  { method: 'get', path: '/api/users/invitations', allowed: admin },
  { method: 'post', path: '/api/users/invitations', allowed: admin },
  { method: 'post', path: '/api/users/invitations/:id/resend', allowed: admin },
  { method: 'delete', path: '/api/users/invitations/:id', allowed: admin },
  { method: 'get', path: '/api/invitations/:token', allowed: 'anyone', params: unknownToken },
  { method: 'post', path: '/api/invitations/:token', allowed: 'anyone', params: unknownToken },
  { method: 'post', path: '/api/password-resets', allowed: 'anyone' },
  { method: 'post', path: '/api/password-resets/:token', allowed: 'anyone', params: unknownToken },
  { method: 'post', path: '/api/session/password', allowed: everyone },
  {
    method: 'get',
    path: '/api/outbox',
    allowed: admin,
    note: 'only while the built-in mail server is in use (as in tests)',
  },
];
