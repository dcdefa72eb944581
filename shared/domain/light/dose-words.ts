import type { PrintStatus } from '../vocabulary';

/**
 * How the light figure on a print's record is counted, in words that match `dose.ts` and
 * `findDosePeriods`: only loans and exhibitions recorded under Loans, once agreed, count;
 * their whole period counts (days still to come included) at the agreed maximum
 * illuminance, since no measured values are used yet. A print merely marked "on display"
 * counts nothing, and the record says so rather than showing a bare 0 lx·h as a fact.
 */
export const DOSE_COUNTED_HOW =
  'Counted from the loans and exhibitions recorded under Loans once agreed (agreed, away or back): ' +
  'their agreed maximum illuminance × hours open a day × every day from first to last, ' +
  'days still to come included. Measured light is not used yet.';

/** A line beside the total when it leaves out time the print spends in light, or null. */
export function doseNotCountedNote(status: PrintStatus, lifetimeLuxHours: number): string | null {
  if (status === 'on display') {
    return lifetimeLuxHours === 0
      ? 'This print is marked on display, but time on display is not counted yet: only displays recorded under Loans (as an exhibition) count.'
      : 'This print is marked on display; time on display outside a loan or exhibition recorded under Loans is not counted.';
  }
  if (lifetimeLuxHours === 0) return 'No agreed loan or exhibition is recorded for this print yet.';
  return null;
}
