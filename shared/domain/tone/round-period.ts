import { addMonths } from './dates';

/**
 * The round that is due now: this calendar month, from its first to its last day. Overdue
 * checks always belong to the round, so everything due up to the month's end is in it.
 */
export function currentRoundPeriod(today: string): { from: string; to: string } {
  const first = `${today.slice(0, 7)}-01`;
  const next = addMonths(first, 1);
  const last = new Date(Date.parse(`${next}T00:00:00Z`) - 86_400_000);
  return { from: first, to: last.toISOString().slice(0, 10) };
}
