import { CURATORIAL_FIELDS } from '../../shared/schemas/print';
import { roleCan, type Role } from '../../shared/domain/roles';

const curatorial = new Set<string>(CURATORIAL_FIELDS);

/** Archivists change anything; curators only title, description and tags (design §2). */
export function mayUpdatePrintFields(role: Role, fields: readonly string[]): boolean {
  if (roleCan(role, 'prints:write')) return true;
  return roleCan(role, 'prints:edit-curatorial') && fields.every((field) => curatorial.has(field));
}

/** Deleted prints are the archivist's to see and restore. */
export function mayListDeletedPrints(role: Role): boolean {
  return roleCan(role, 'prints:write');
}
