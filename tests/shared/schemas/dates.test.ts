import { describe, expect, it } from 'vitest';
import { isoDate, pastIsoDate } from '../../../shared/schemas/common';

const message = (schema: typeof isoDate | typeof pastIsoDate, text: string) =>
  schema.safeParse(text).error?.issues[0]?.message;

describe('exact date fields', () => {
  it('say that a day which does not exist is not a date', () => {
    expect(message(isoDate, '2026-02-30')).toBe(
      '2026-02-30 is not a date: February 2026 has 28 days.',
    );
    expect(message(pastIsoDate, '2024-02-31')).toBe(
      '2024-02-31 is not a date: February 2024 has 29 days.',
    );
  });

  it('show the form wanted for text that is not a date at all', () => {
    expect(message(isoDate, '30/02/2026')).toBe('Use a date like 2026-05-14');
    expect(message(isoDate, 'soon')).toBe('Use a date like 2026-05-14');
    expect(isoDate.safeParse('2024-02-29').success).toBe(true);
  });

  it('call a badly written date only that, not also a future one', () => {
    // 31/02/2024 sorts after today's ISO date as text; it must not be called future.
    const issues = pastIsoDate.safeParse('31/02/2024').error?.issues ?? [];
    expect(issues.map((issue) => issue.message)).toEqual(['Use a date like 2026-05-14']);
    expect(message(pastIsoDate, '2999-01-01')).toBe('The date cannot be in the future');
  });
});
