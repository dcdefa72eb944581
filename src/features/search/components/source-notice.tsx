import { useQuery } from '@tanstack/react-query';
import { useCan } from '@/lib/session';
import { sourceQueries } from '@/lib/sources-api';

/** Says the results are one source's prints (named for roles that read sources), with a way out. */
export function SourceNotice({ sourceId, onClear }: { sourceId: string; onClear: () => void }) {
  const can = useCan();
  const sources = useQuery({ ...sourceQueries.list(), enabled: can('sources:read') });
  const name = sources.data?.find((source) => String(source.id) === sourceId)?.name;
  return (
    <p role="status" className="rounded border border-gall/40 bg-gall-light px-2 py-1.5 text-sm">
      Only prints from {name ?? 'one source'}.{' '}
      <button type="button" className="underline" onClick={onClear}>
        Show every source
      </button>
    </p>
  );
}
