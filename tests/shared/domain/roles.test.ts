import { describe, expect, it } from 'vitest';
import { abilitiesOf, roleCan } from '../../../shared/domain/roles';

// The table of design §2 (our own product design): who may do what.
describe('roles', () => {
  it('lets a viewer only read the catalogue', () => {
    expect(abilitiesOf('viewer')).toEqual(['catalogue:read']);
  });

  it('gives curators locations, originals, exports and curatorial edits, but not cataloguing', () => {
    expect(roleCan('curator', 'locations:read')).toBe(true);
    expect(roleCan('curator', 'prints:edit-curatorial')).toBe(true);
    expect(roleCan('curator', 'prints:write')).toBe(false);
  });

  it('keeps tone checks for conservators and cataloguing for archivists', () => {
    expect(roleCan('conservator', 'tone:write')).toBe(true);
    expect(roleCan('conservator', 'prints:write')).toBe(false);
    expect(roleCan('archivist', 'prints:write')).toBe(true);
    expect(roleCan('archivist', 'tone:write')).toBe(false);
  });

  it('gives an admin everything, users included', () => {
    expect(roleCan('admin', 'users:manage')).toBe(true);
    expect(roleCan('archivist', 'users:manage')).toBe(false);
  });
});
