import { describe, expect, it } from 'vitest';
import { isCheckOverdue } from '../../../../shared/domain/tone/check-date';

describe('isCheckOverdue (tone watch, the check round and the print record)', () => {
  it('is overdue only once the due day has passed', () => {
    expect(isCheckOverdue('2026-05-08', '2026-05-09')).toBe(true);
    expect(isCheckOverdue('2026-05-09', '2026-05-09')).toBe(false);
    expect(isCheckOverdue('2026-05-10', '2026-05-09')).toBe(false);
    expect(isCheckOverdue('2025-12-31', '2026-01-01')).toBe(true);
  });

  it('no due date is never overdue', () => {
    expect(isCheckOverdue(null, '2026-05-09')).toBe(false);
  });
});
