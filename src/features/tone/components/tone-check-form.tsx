import { useEffect, useRef, useState, type FormEvent } from 'react';
import { todayIso } from '@shared/domain/tone/check-date';
import { withMinusSign } from '@shared/domain/format';
import { STANDARD_PATCHES } from '@shared/domain/tone/patches';
import type { Reading } from '@shared/domain/tone/comparison';
import { TONE_METHODS } from '@shared/domain/vocabulary';
import type { ToneCheckResponse } from '@shared/types/tone';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice } from '@/components/ui/notices';
import { ApiError } from '@/lib/api-client';
import { useLogToneCheck } from '../api/tone-mutations';
import { readingNumber } from './format';
import { useOneAtATime } from '@/lib/use-one-at-a-time';

const CHANNELS = ['L', 'a', 'b'] as const;
const NOT_A_NUMBER = 'Type a number, such as 52.3 (a decimal comma is fine).';

interface FieldProblem {
  path: string;
  message: string;
}

interface Row {
  key: number;
  patch: string;
  L: string;
  a: string;
  b: string;
  last?: Reading;
}

let rowKey = 0;
const rowFor = (patch: string, last?: Reading): Row => ({
  key: rowKey++,
  patch,
  L: '',
  a: '',
  b: '',
  last,
});

/** Patch rows from the last check (or the four standard patches), values left to measure. */
function initialRows(last: readonly Reading[] | undefined): Row[] {
  return last && last.length > 0
    ? last.map((reading) => rowFor(reading.patch, reading))
    : STANDARD_PATCHES.map((patch) => rowFor(patch));
}

/** What has been typed into the form and not yet logged (kept per print by a round). */
export interface ToneCheckDraft {
  checkedOn: string;
  method: (typeof TONE_METHODS)[number];
  instrument: string;
  baseline: boolean;
  rows: Row[];
}

/**
 * Logs a check. Inputs run patch by patch (L*, a*, b*) in tab order, so an operator types
 * the instrument's three numbers and tabs on; Enter anywhere logs the check.
 */
export function ToneCheckForm({
  printId,
  lastReadings,
  lastInstrument,
  hasBaseline,
  onLogged,
  onSubmitted,
  draft,
  onDraftChange,
  focusOnMount = false,
}: {
  printId: number;
  lastReadings?: readonly Reading[];
  lastInstrument?: string | null;
  hasBaseline: boolean;
  onLogged?: (result: ToneCheckResponse) => void;
  /** A new attempt began: what the last one said no longer applies. */
  onSubmitted?: () => void;
  /** Values typed earlier for this print and not yet logged. */
  draft?: ToneCheckDraft;
  onDraftChange?: (draft: ToneCheckDraft) => void;
  /** Puts the cursor in the first reading (a round moving on to its next print). */
  focusOnMount?: boolean;
}) {
  const log = useLogToneCheck(printId);
  const [checkedOn, setCheckedOn] = useState(draft?.checkedOn ?? todayIso());
  const [method, setMethod] = useState<(typeof TONE_METHODS)[number]>(
    draft?.method ?? 'spectrophotometer',
  );
  const [instrument, setInstrument] = useState(draft?.instrument ?? lastInstrument ?? '');
  const [baseline, setBaseline] = useState(draft?.baseline ?? !hasBaseline);
  const [rows, setRows] = useState<Row[]>(() => draft?.rows ?? initialRows(lastReadings));
  const firstReading = useRef<HTMLInputElement>(null);
  useEffect(() => {
    if (focusOnMount) firstReading.current?.focus();
  }, [focusOnMount]);
  useEffect(() => {
    onDraftChange?.({ checkedOn, method, instrument, baseline, rows });
  }, [onDraftChange, checkedOn, method, instrument, baseline, rows]);
  // Values that are not numbers are named here, before anything is sent: sent as JSON they
  // would arrive empty, and the answer would say "Fill this in." of a box that has text in it.
  const [notNumbers, setNotNumbers] = useState<FieldProblem[]>([]);
  // The server numbers the readings it was sent; rows left empty were not sent.
  const [sentKeys, setSentKeys] = useState<number[]>([]);
  const fieldErrors: FieldProblem[] = notNumbers.length
    ? notNumbers
    : log.error instanceof ApiError
      ? log.error.errors.map((e) => ({ ...e, path: rowPath(e.path, sentKeys, rows) }))
      : [];
  const errorAt = (path: string) => fieldErrors.find((e) => e.path === path)?.message;

  const update = (key: number, change: Partial<Row>) =>
    setRows((current) => current.map((row) => (row.key === key ? { ...row, ...change } : row)));

  const oneAtATime = useOneAtATime();
  const logOnce = oneAtATime(() => {
    onSubmitted?.();
    // A row left wholly empty was not measured this time: left out, not refused.
    const measured = rows.filter((row) => [row.L, row.a, row.b].some((value) => value.trim()));
    setSentKeys(measured.map((row) => row.key));
    return (
      log
        .mutateAsync({
          checkedOn,
          method,
          instrument: instrument || null,
          illuminant: 'D50',
          observer: '2',
          baseline,
          readings: measured.map((row) => ({
            patch: row.patch.trim(),
            L: readingNumber(row.L),
            a: readingNumber(row.a),
            b: readingNumber(row.b),
          })),
        })
        .then((result) => {
          setRows(initialRows(result.readings));
          setBaseline(false);
          onLogged?.(result);
        })
        // The refusal is shown from `log.error`, beside its fields.
        .catch(() => undefined)
    );
  });
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const problems = rows.flatMap((row, index) =>
      CHANNELS.filter(
        (channel) => row[channel].trim() && Number.isNaN(readingNumber(row[channel])),
      ).map((channel) => ({ path: `readings.${index}.${channel}`, message: NOT_A_NUMBER })),
    );
    setNotNumbers(problems);
    if (problems.length === 0) void logOnce();
  };

  return (
    <form onSubmit={submit} aria-label="Log a tone check" className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-3">
        <DateField
          label="Checked on"
          value={checkedOn}
          onChange={(e) => setCheckedOn(e.target.value)}
          error={errorAt('checkedOn')}
          required
        />
        <SelectField
          label="Method"
          value={method}
          onChange={(e) => setMethod(e.target.value as typeof method)}
          options={TONE_METHODS.map((m) => ({ value: m, label: m }))}
          hint="Lab D50/2° (ISO 13655)"
        />
        <TextField
          label="Instrument"
          value={instrument}
          onChange={(e) => setInstrument(e.target.value)}
        />
      </div>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={baseline} onChange={(e) => setBaseline(e.target.checked)} />
        Baseline: compare later checks with this one (starts a new series)
      </label>
      <fieldset>
        <legend className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">
          Readings
        </legend>
        <table className="readings-table w-full text-sm">
          <thead>
            <tr className="text-left text-xs text-ink-faint">
              <th scope="col" className="pr-2 font-normal">
                Patch
              </th>
              <th scope="col" className="px-1 font-normal">
                L*
              </th>
              <th scope="col" className="px-1 font-normal">
                a*
              </th>
              <th scope="col" className="px-1 font-normal">
                b*
              </th>
              {/* No column name on a phone's stacked rows: "REMOVE" read as a field heading. */}
              <th scope="col" data-column-label="">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row, index) => (
              <tr key={row.key}>
                <td className="pr-2 pb-1">
                  <input
                    aria-label={`Patch ${index + 1} name`}
                    className="w-full max-w-40 min-w-[5.5rem] rounded border border-paper-edge bg-white px-2 py-1"
                    value={row.patch}
                    onChange={(e) => update(row.key, { patch: e.target.value })}
                  />
                </td>
                {CHANNELS.map((channel) => (
                  <td key={channel} className="px-1 pb-1">
                    <input
                      ref={index === 0 && channel === 'L' ? firstReading : undefined}
                      aria-label={`${row.patch || `Patch ${index + 1}`} ${channel}*`}
                      aria-invalid={errorAt(`readings.${index}.${channel}`) ? true : undefined}
                      title={errorAt(`readings.${index}.${channel}`)}
                      inputMode="decimal"
                      className="w-full max-w-24 min-w-[3.5rem] rounded border border-paper-edge bg-white px-2 py-1 tabular-nums aria-[invalid=true]:border-alert"
                      aria-describedby={row.last ? `last-${row.key}-${channel}` : undefined}
                      value={row[channel]}
                      onChange={(e) => update(row.key, { [channel]: e.target.value })}
                    />
                    {row.last && (
                      <div
                        id={`last-${row.key}-${channel}`}
                        className="mt-0.5 text-xs whitespace-nowrap text-ink-faint tabular-nums"
                      >
                        last: {withMinusSign(String(row.last[channel]))}
                      </div>
                    )}
                  </td>
                ))}
                <td className="pb-1">
                  <Button
                    className="px-2"
                    aria-label={`Remove ${row.patch || `patch ${index + 1}`}`}
                    onClick={() => setRows((r) => r.filter((x) => x.key !== row.key))}
                    disabled={rows.length === 1}
                  >
                    <span aria-hidden="true">×</span>
                    {/* On a phone the row is stacked: the button says what it does. */}
                    <span className="sm:hidden">Remove this spot</span>
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        <ul className="mt-1 text-xs text-alert">
          {fieldErrors
            .filter((e) => e.path.startsWith('readings'))
            .map((e) => (
              <li key={e.path}>{readingProblem(e.path, e.message, rows)}</li>
            ))}
        </ul>
        <Button className="mt-1" onClick={() => setRows((r) => [...r, rowFor('')])}>
          + Add a spot
        </Button>
      </fieldset>
      {!(log.error instanceof ApiError && log.error.status === 422) && (
        <ErrorNotice error={log.error} />
      )}
      <Button type="submit" tone="primary" disabled={log.isPending}>
        {log.isPending ? 'Logging…' : 'Log check'}
      </Button>
    </form>
  );
}

/**
 * A refused reading in plain words: named by its patch (and channel) when the problem is one
 * row's, the message alone when it is the whole list's ("Give at least one reading").
 */
function readingProblem(path: string, message: string, rows: Row[]): string {
  const match = /^readings\.(\d+)(?:\.(\w+))?$/.exec(path);
  if (!match) return message;
  const patch = rows[Number(match[1])]?.patch || 'patch';
  return `${match[2] ? `${patch} ${match[2]}*` : patch}: ${message}`;
}

/**
 * A server path about the `n`th reading sent, as a path about the form's row it came from
 * (rows left empty were not sent, so the two numberings can differ).
 */
function rowPath(path: string, sentKeys: number[], rows: Row[]): string {
  const match = /^readings\.(\d+)(.*)$/.exec(path);
  if (!match) return path;
  const row = rows.findIndex((r) => r.key === sentKeys[Number(match[1])]);
  return row < 0 ? path : `readings.${row}${match[2]}`;
}
