/** The five roles, least to most trusted (design §2). */
export const ROLES = ['viewer', 'curator', 'conservator', 'archivist', 'admin'] as const;
export type Role = (typeof ROLES)[number];

/** Everything a route or screen may be allowed to do. */
export const ABILITIES = [
  'catalogue:read',
  'locations:read',
  'originals:read',
  'exports:read',
  'prints:edit-curatorial',
  'prints:write',
  'reference:write',
  'tone:write',
  'audit:read',
  'users:manage',
  'condition:read',
  'condition:write',
  'samples:write',
  'searches:save',
  'imports:write',
  'settings:read',
  'settings:write',
  'fixity:run',
  'outbox:read',
  'sources:read',
  'sources:write',
  /** Source contacts, prices paid and marks kept private (issue 19: archivists and admins). */
  'registrar:confidential',
  'prints:move',
  'labels:print',
  'environment:write',
  /** Plan loans and exhibitions and pick their prints (issue 18: curators and above). */
  'loans:plan',
] as const;
export type Ability = (typeof ABILITIES)[number];

const viewer: Ability[] = ['catalogue:read'];
const curator: Ability[] = [
  ...viewer,
  'locations:read',
  'originals:read',
  'exports:read',
  'prints:edit-curatorial',
  'condition:read',
  'searches:save',
  'sources:read',
  'loans:plan',
];

/** One line per role: what it may do. Conservator and archivist both build on curator. */
const ROLE_ABILITIES: Record<Role, ReadonlySet<Ability>> = {
  viewer: new Set(viewer),
  curator: new Set(curator),
  conservator: new Set([
    ...curator,
    'tone:write',
    'condition:write',
    'samples:write',
    'settings:read',
    'environment:write',
  ]),
  archivist: new Set([
    ...curator,
    'prints:write',
    'reference:write',
    'audit:read',
    'samples:write',
    'imports:write',
    'sources:write',
    'registrar:confidential',
    'prints:move',
    'labels:print',
  ]),
  admin: new Set(ABILITIES),
};

/** Whether a role carries an ability. */
export function roleCan(role: Role, ability: Ability): boolean {
  return ROLE_ABILITIES[role].has(ability);
}

/** The abilities of a role, in a stable order, for the client to show or hide controls. */
export function abilitiesOf(role: Role): Ability[] {
  return ABILITIES.filter((ability) => roleCan(role, ability));
}

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}
