import type { StoredTone } from '../../shared/domain/tone/stored-state';
import { readJsonText } from '../../server/repositories/decode-columns';

/** A print row's stored tone columns (`SELECT tone_status, …`) in the domain's stored form. */
export function storedToneColumns(row: Record<string, unknown>): StoredTone {
  return {
    status: row.tone_status as StoredTone['status'],
    flags: readJsonText(row.tone_flags)!,
    urgency: row.tone_urgency as number,
    nextCheckDue: row.next_check_due as string | null,
    baselineOn: row.tone_baseline_on as string | null,
    ratePerYear: row.tone_rate_per_year as number | null,
    sparkline: readJsonText(row.tone_sparkline),
  };
}
