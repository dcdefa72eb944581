/** Today's date (UTC), as every "not in the future" rule of the record reads it. */
export const todayIso = (): string => new Date().toISOString().slice(0, 10);

/** The words every dated record uses when its date lies ahead. */
export const FUTURE_DATE_MESSAGE = 'The date cannot be in the future';

/**
 * Why a tone check cannot carry this date, or null when it can: not after today, and not
 * before the print was made. An approximate making date ("c. 2025", a year, a range) is
 * compared with the start of its range, so only a check surely before the print is refused.
 * A check on the making day itself is allowed (the dry-down warning says what it is worth).
 */
export function checkDateProblem(
  checkedOn: string,
  madeFrom: string | null,
  today: string = todayIso(),
): string | null {
  if (checkedOn > today) return FUTURE_DATE_MESSAGE;
  if (madeFrom && checkedOn < madeFrom)
    return `The check cannot be dated before the print was made (${madeFrom})`;
  return null;
}
