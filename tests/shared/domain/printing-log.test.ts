import { describe, expect, it } from 'vitest';
import { median, suggestExposure, type LoggedPrint } from '../../../shared/domain/printing-log';

const print = (over: Partial<LoggedPrint>): LoggedPrint => ({
  paperId: 1,
  lightSource: 'open shade',
  exposureMinutes: 40,
  toneStatus: 'unchecked',
  ...over,
});

describe('median', () => {
  it('is the middle value, or the mean of the two middle ones', () => {
    expect(median([1, 2, 9])).toBe(2);
    expect(median([1, 2, 4, 9])).toBe(3);
  });
});

describe('suggested exposure', () => {
  it('starts from the prints that stayed steady on the same paper and light', () => {
    const log = [
      print({ exposureMinutes: 30, toneStatus: 'fading' }),
      print({ exposureMinutes: 40, toneStatus: 'steady' }),
      print({ exposureMinutes: 50, toneStatus: 'steady' }),
      print({ exposureMinutes: 90, toneStatus: 'steady', paperId: 2 }),
      print({ exposureMinutes: 10, toneStatus: 'steady', lightSource: 'direct sun' }),
    ];
    expect(suggestExposure(log, { paperId: 1, lightSource: ' Open  Shade' })).toEqual({
      minutes: 45,
      low: 40,
      high: 50,
      basedOn: 2,
      match: 'same',
      outcome: 'steady',
    });
  });

  it('falls back to the same light on other papers, and says nothing for an unknown light', () => {
    const log = [print({ paperId: 2, exposureMinutes: 12, lightSource: 'UV unit' })];
    expect(suggestExposure(log, { paperId: 1, lightSource: 'UV unit' })).toMatchObject({
      minutes: 12,
      match: 'light only',
    });
    expect(suggestExposure(log, { paperId: 1, lightSource: 'direct sun' })).toBeNull();
    expect(
      suggestExposure([print({ exposureMinutes: null })], {
        paperId: 1,
        lightSource: 'open shade',
      }),
    ).toBeNull();
  });
});
