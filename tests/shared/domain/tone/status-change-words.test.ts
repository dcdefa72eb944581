import { describe, expect, it } from 'vitest';
import { statusChangeAlert, statusChangeWords } from '../../../../shared/domain/tone/stored-state';

describe('a change of tone status in plain words', () => {
  it('says where the tone went and where it was, with no arrow', () => {
    expect(statusChangeWords('watch', 'steady')).toBe('Tone back to steady (was on watch)');
    expect(statusChangeWords('fading', 'steady')).toBe('Tone back to steady (was fading)');
    expect(statusChangeWords('steady', 'watch')).toBe('Tone put on watch (was steady)');
    expect(statusChangeWords('yellowing', 'watch')).toBe('Tone eased to watch (was yellowing)');
    expect(statusChangeWords('steady', 'fading')).toBe('Tone now fading (was steady)');
    expect(statusChangeWords('watch', 'darkening')).toBe('Tone now darkening (was on watch)');
  });

  it('is the reason of the alert a change opens, its top flag after a colon', () => {
    const alert = statusChangeAlert('watch', {
      status: 'yellowing',
      flags: [{ kind: 'yellowing', patch: 'dmin', reason: 'bare paper b* +3.2' }],
    } as Parameters<typeof statusChangeAlert>[1]);
    expect(alert).toEqual({
      kind: 'yellowing',
      reason: 'Tone now yellowing (was on watch): bare paper b* +3.2',
    });
    expect(alert!.reason).not.toContain('→');
  });
});
