import { useQuery } from '@tanstack/react-query';
import { changedFields } from '@shared/domain/changed-fields';
import { formatDateTime } from '@shared/domain/format';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { printQueries } from '@/lib/catalogue';

const ACTION_WORDS: Record<string, string> = {
  create: 'Catalogued',
  update: 'Changed',
  delete: 'Deleted',
  restore: 'Restored',
};
/**
 * Bookkeeping fields every change touches, and fields derived from the processing history;
 * naming them would hide what the person actually changed.
 */
const IGNORED = [
  'updatedAt',
  'createdAt',
  'fixingMinutes',
  'washingMinutes',
  'processingRisk',
  'riskReasons',
];

/** The record's own words for its fields. */
const FIELD_WORDS: Record<string, string> = {
  accessionNumber: 'accession number',
  madeOn: 'date made',
  processing: 'processing history',
  imageWidthMm: 'image size',
  imageHeightMm: 'image size',
  sheetWidthMm: 'sheet size',
  sheetHeightMm: 'sheet size',
  location: 'place',
  toneStatus: 'tone',
  deletedAt: 'deletion',
};

const inWords = (fields: string[]) => [...new Set(fields.map((f) => FIELD_WORDS[f] ?? f))];

/** Who changed the record, when, and which fields: the audit trail in words. */
export function PrintHistory({ printId }: { printId: number }) {
  const history = useQuery(printQueries.history(printId));
  if (history.error) return <ErrorNotice error={history.error} />;
  if (!history.data) return <Loading label="Loading the history…" />;
  return (
    <ol className="flex flex-col gap-1.5 text-sm">
      {history.data.map((event, index) => {
        const fields =
          event.action === 'update'
            ? inWords(changedFields(event.before, event.after, IGNORED))
            : [];
        return (
          <li key={`${event.at}-${index}`} className="flex flex-wrap gap-x-2">
            <time dateTime={event.at} className="text-ink-faint tabular-nums">
              {formatDateTime(event.at)}
            </time>
            <span>
              {ACTION_WORDS[event.action] ?? event.action} by{' '}
              {event.user ? (
                <span title={event.user.email}>{event.user.name}</span>
              ) : (
                'a removed user'
              )}
              {fields.length > 0 && <span className="text-ink-soft">: {fields.join(', ')}</span>}
            </span>
          </li>
        );
      })}
    </ol>
  );
}
