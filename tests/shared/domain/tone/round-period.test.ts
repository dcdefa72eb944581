import { describe, expect, it } from 'vitest';
import { currentRoundPeriod } from '../../../../shared/domain/tone/round-period';

// Calendar facts (Gregorian calendar): December has 31 days, February 2028 has 29.
describe('the check round due now', () => {
  it('is this calendar month, not the next one', () => {
    expect(currentRoundPeriod('2026-12-02')).toEqual({ from: '2026-12-01', to: '2026-12-31' });
  });

  it('ends on the last day of a short month', () => {
    expect(currentRoundPeriod('2028-02-15')).toEqual({ from: '2028-02-01', to: '2028-02-29' });
  });
});
