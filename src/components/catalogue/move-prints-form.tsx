import { useQuery } from '@tanstack/react-query';
import { formatCount } from '@shared/domain/format';
import { MOVEMENT_REASONS, type MovementReason } from '@shared/domain/movements';
import { todayIso } from '@shared/domain/tone/check-date';
import type { BulkMoveResult } from '@shared/types/movement';
import { useId, useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice } from '@/components/ui/notices';
import { useMovePrints } from '@/lib/catalogue';
import { referenceQueries } from '@/lib/reference-api';

const byPath = (a: { path: string }, b: { path: string }) => a.path.localeCompare(b.path);

/**
 * Moves the given prints in one step: one movement each, on a day, for a reason. With
 * `placeId` the place is fixed ("move here"); otherwise the person chooses it.
 */
export function MovePrintsForm({
  printIds,
  placeId,
  onMoved,
  submitLabel = 'Move',
}: {
  printIds: readonly number[] | (() => Promise<number[]>);
  placeId?: number;
  onMoved?: (result: BulkMoveResult) => void;
  submitLabel?: string;
}) {
  const headingId = useId();
  const places = useQuery({ ...referenceQueries.locations(), enabled: placeId === undefined });
  const move = useMovePrints();
  const [to, setTo] = useState('');
  const [reason, setReason] = useState<MovementReason>('storage');
  const [movedOn, setMovedOn] = useState(todayIso());
  const [done, setDone] = useState<BulkMoveResult | null>(null);
  const [resolveError, setResolveError] = useState<unknown>(null);

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    setDone(null);
    setResolveError(null);
    let ids: number[];
    try {
      ids = typeof printIds === 'function' ? await printIds() : [...printIds];
    } catch (error) {
      setResolveError(error);
      return;
    }
    const toLocationId = placeId ?? Number(to);
    move.mutate(
      { printIds: ids, toLocationId, reason, movedOn, note: null },
      {
        onSuccess: (result) => {
          setDone(result);
          onMoved?.(result);
        },
      },
    );
  };
  const count = typeof printIds === 'function' ? null : printIds.length;

  return (
    <form onSubmit={submit} aria-labelledby={headingId} className="flex flex-col gap-2">
      <h3 id={headingId} className="sr-only">
        Move prints
      </h3>
      {placeId === undefined && (
        <SelectField
          label="To the place"
          value={to}
          onChange={(event) => setTo(event.target.value)}
          placeholder="Choose a place"
          options={[...(places.data ?? [])]
            .sort(byPath)
            .map((place) => ({ value: place.id, label: `${place.code} — ${place.path}` }))}
        />
      )}
      <SelectField
        label="Why"
        value={reason}
        onChange={(event) => setReason(event.target.value as MovementReason)}
        options={MOVEMENT_REASONS.map((value) => ({ value, label: value }))}
      />
      <DateField
        label="Moved on"
        value={movedOn}
        max={todayIso()}
        onChange={(event) => setMovedOn(event.target.value)}
      />
      <Button
        type="submit"
        tone="primary"
        disabled={count === 0 || (placeId === undefined && !to) || move.isPending}
      >
        {count === null ? submitLabel : `${submitLabel} ${formatCount(count, 'print')}`}
      </Button>
      <ErrorNotice error={resolveError ?? move.error} />
      {done && (
        <p role="status" className="text-sm">
          Moved {formatCount(done.moved, 'print')} to {done.to.code} on {done.movedOn}.
        </p>
      )}
    </form>
  );
}
