/** Today's date (UTC), as every "not in the future" rule of the record reads it. */
export const todayIso = (): string => new Date().toISOString().slice(0, 10);

/** The words every dated record uses when its date lies ahead. */
export const FUTURE_DATE_MESSAGE = 'The date cannot be in the future';

/**
 * Why a dated record of a print (a tone check, a condition report) cannot carry this date,
 * or null when it can: not after today, and not before the print was made. An approximate
 * making date ("c. 2025", a year, a range) is compared with the start of its range, so only
 * a record surely before the print is refused. A record on the making day itself is allowed
 * (for a tone check the dry-down warning says what it is worth).
 */
export function checkDateProblem(
  checkedOn: string,
  madeFrom: string | null,
  today: string = todayIso(),
  record: 'check' | 'report' = 'check',
): string | null {
  if (checkedOn > today) return FUTURE_DATE_MESSAGE;
  if (madeFrom && checkedOn < madeFrom)
    return `The ${record} cannot be dated before the print was made (${madeFrom})`;
  return null;
}

/**
 * Whether a print's next tone check is overdue on a day: its due date lies before that day
 * (due today is not yet overdue). Tone watch, the check round and the print record share it.
 */
export function isCheckOverdue(nextCheckDue: string | null, on: string = todayIso()): boolean {
  return nextCheckDue !== null && nextCheckDue < on;
}
