import type { Role } from '../domain/roles';

export interface UserView {
  id: number;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  lastSignInAt: string | null;
  createdAt: string;
}

export type InvitationState = 'open' | 'accepted' | 'revoked' | 'expired';

export interface InvitationView {
  id: number;
  email: string;
  role: Role;
  state: InvitationState;
  expiresAt: string;
  createdAt: string;
}

/** What the accept page shows before the new colleague picks a name and password. */
export interface InvitationPreview {
  email: string;
  role: Role;
  expiresAt: string;
}

export interface UsersResponse {
  items: UserView[];
}

export interface InvitationsResponse {
  items: InvitationView[];
}
