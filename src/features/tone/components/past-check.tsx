import { formatCount, formatDate } from '@shared/domain/format';
import { useState, type FormEvent } from 'react';
import type { ToneCheckView } from '@shared/types/tone';
import { Button } from '@/components/ui/button';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice } from '@/components/ui/notices';
import { ApiError } from '@/lib/api-client';
import { useDeleteToneCheck, useUpdateToneCheck } from '../api/tone-mutations';
import { patchLabel, readingNumber } from './format';

type Channel = 'L' | 'a' | 'b';
const CHANNELS: Channel[] = ['L', 'a', 'b'];

/** One past check: opens to its readings; a conservator corrects it, makes it the baseline or deletes it. */
export function PastCheck({
  check,
  isBaseline,
  editable,
}: {
  check: ToneCheckView;
  isBaseline: boolean;
  editable: boolean;
}) {
  const [correcting, setCorrecting] = useState(false);
  const [asking, setAsking] = useState(false);
  const update = useUpdateToneCheck(check.id);
  const remove = useDeleteToneCheck();
  return (
    <li>
      <details>
        <summary className="flex cursor-pointer flex-wrap items-center gap-2">
          <span className="tabular-nums">{formatDate(check.checkedOn, true)}</span>
          <span className="text-ink-faint">
            {check.method}
            {check.instrument ? `, ${check.instrument}` : ''} ·{' '}
            {formatCount(check.readings.length, 'patch')}
            {check.checkedBy ? ` · ${check.checkedBy.name}` : ''}
          </span>
          {isBaseline && <span className="rounded bg-gall-light px-1.5 text-xs">baseline</span>}
        </summary>
        <div className="mt-2 mb-3 space-y-2 pl-4">
          {correcting ? (
            <CorrectionForm check={check} onDone={() => setCorrecting(false)} />
          ) : (
            <ReadingsTable check={check} />
          )}
          {check.notes && <p className="text-ink-soft">{check.notes}</p>}
          {editable && !correcting && (
            <p className="flex flex-wrap gap-2">
              <Button className="px-2 py-0.5 text-xs" onClick={() => setCorrecting(true)}>
                Correct
              </Button>
              {!isBaseline && (
                <Button
                  className="px-2 py-0.5 text-xs"
                  disabled={update.isPending}
                  onClick={() => update.mutate({ baseline: true })}
                >
                  Make this the baseline
                </Button>
              )}
              <Button tone="danger" className="px-2 py-0.5 text-xs" onClick={() => setAsking(true)}>
                Delete
              </Button>
            </p>
          )}
          <ConfirmDialog
            open={asking}
            title={`Delete the check of ${formatDate(check.checkedOn)}?`}
            confirmLabel="Delete"
            danger
            onCancel={() => setAsking(false)}
            onConfirm={() => {
              setAsking(false);
              remove.mutate(check.id);
            }}
          />
          <ErrorNotice error={update.error ?? remove.error} />
        </div>
      </details>
    </li>
  );
}

function ReadingsTable({ check }: { check: ToneCheckView }) {
  return (
    <table className="text-sm tabular-nums">
      <caption className="sr-only">Readings of the check of {formatDate(check.checkedOn)}</caption>
      <thead>
        <tr className="text-left text-xs text-ink-faint">
          <th scope="col" className="pr-3 font-normal">
            Patch
          </th>
          {CHANNELS.map((channel) => (
            <th key={channel} scope="col" className="px-2 text-right font-normal">
              {channel}*
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {check.readings.map((reading) => (
          <tr key={reading.patch}>
            <th scope="row" className="pr-3 text-left font-normal">
              {patchLabel(reading.patch)}
            </th>
            {CHANNELS.map((channel) => (
              <td key={channel} className="px-2 text-right">
                {reading[channel]}
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The check's date and readings, corrected in place; the server keeps the old values. */
function CorrectionForm({ check, onDone }: { check: ToneCheckView; onDone: () => void }) {
  const update = useUpdateToneCheck(check.id);
  const [checkedOn, setCheckedOn] = useState(check.checkedOn);
  const [values, setValues] = useState(() =>
    check.readings.map((r) => ({ patch: r.patch, L: String(r.L), a: String(r.a), b: String(r.b) })),
  );
  const errors = update.error instanceof ApiError ? update.error.errors : [];
  const submit = (event: FormEvent) => {
    event.preventDefault();
    update.mutate(
      {
        checkedOn,
        readings: values.map((v) => ({
          patch: v.patch,
          L: readingNumber(v.L),
          a: readingNumber(v.a),
          b: readingNumber(v.b),
        })),
      },
      { onSuccess: onDone },
    );
  };
  return (
    <form
      onSubmit={submit}
      aria-label={`Correct the check of ${formatDate(check.checkedOn)}`}
      className="space-y-2"
    >
      <DateField
        label="Checked on"
        value={checkedOn}
        onChange={(e) => setCheckedOn(e.target.value)}
        error={errors.find((e) => e.path === 'checkedOn')?.message}
      />
      <table className="text-sm">
        <tbody>
          {values.map((row, index) => (
            <tr key={row.patch}>
              <th scope="row" className="pr-2 text-left font-normal">
                {patchLabel(row.patch)}
              </th>
              {CHANNELS.map((channel) => (
                <td key={channel} className="px-1 pb-1">
                  <input
                    aria-label={`${row.patch} ${channel}*`}
                    inputMode="decimal"
                    aria-invalid={
                      errors.some((e) => e.path === `readings.${index}.${channel}`) || undefined
                    }
                    className="w-20 rounded border border-paper-edge bg-white px-2 py-1 tabular-nums aria-[invalid=true]:border-alert"
                    value={row[channel]}
                    onChange={(e) =>
                      setValues((all) =>
                        all.map((v, i) => (i === index ? { ...v, [channel]: e.target.value } : v)),
                      )
                    }
                  />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {errors
        .filter((e) => e.path.startsWith('readings'))
        .map((e) => (
          <p key={e.path} className="text-xs text-alert">
            {e.message}
          </p>
        ))}
      {!(update.error instanceof ApiError && update.error.status === 422) && (
        <ErrorNotice error={update.error} />
      )}
      <p className="flex gap-2">
        <Button type="submit" tone="primary" disabled={update.isPending}>
          {update.isPending ? 'Saving…' : 'Save the correction'}
        </Button>
        <Button onClick={onDone}>Cancel</Button>
      </p>
    </form>
  );
}
