import { describe, expect, it } from 'vitest';
import { ROLES } from '../../../shared/domain/roles';
import { roleCanSentence } from '../../../src/components/ui/no-access';

describe('the no-access notice’s sentence about the reader’s role', () => {
  it('has a verb before “everything”', () => {
    expect(roleCanSentence('archivist')).toMatch(
      /^As an archivist you can do everything a curator can, plus /,
    );
    expect(roleCanSentence('curator')).toMatch(
      /^As a curator you can do everything a viewer can, plus /,
    );
    expect(roleCanSentence('conservator')).toMatch(/^As a conservator you can do everything /);
    expect(roleCanSentence('admin')).toBe(
      'As an admin you can do everything, including people, invitations and settings.',
    );
    expect(roleCanSentence('viewer')).toMatch(/^As a viewer you can read catalogue records/);
  });

  it('never reads “can everything” for any role', () => {
    for (const role of ROLES) expect(roleCanSentence(role)).not.toMatch(/can everything/);
  });
});
