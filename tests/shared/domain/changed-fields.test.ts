import { describe, expect, it } from 'vitest';
import { changedFields } from '../../../shared/domain/changed-fields';

// Plain structural comparison of two JSON snapshots (our own rule: a field changed when its
// JSON differs), as the audit trail stores them.
describe('changed fields', () => {
  it('names the fields whose values differ, nested values compared whole', () => {
    const before = {
      title: 'Weir',
      tags: ['river'],
      processing: [{ stage: 'fixing', minutes: 6 }],
    };
    const after = {
      title: 'Weir',
      tags: ['river', 'mill'],
      processing: [{ stage: 'fixing', minutes: 12 }],
    };
    expect(changedFields(before, after)).toEqual(['processing', 'tags']);
  });

  it('counts a field added or removed, and skips ignored ones', () => {
    expect(
      changedFields({ a: 1, updatedAt: 'x' }, { b: 2, updatedAt: 'y' }, ['updatedAt']),
    ).toEqual(['a', 'b']);
  });

  it('treats a missing snapshot (create, delete) as empty', () => {
    expect(changedFields(null, { title: 'New' })).toEqual(['title']);
  });
});
