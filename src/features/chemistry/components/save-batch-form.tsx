import { useState, type FormEvent } from 'react';
import { todayIso } from '@shared/domain/tone/check-date';
import { Link } from 'react-router-dom';
import { batchKindsFor, findChemical } from '@shared/domain/chemistry/chemicals';
import { BATCH_KINDS, type BatchKind } from '@shared/domain/vocabulary';
import type { SolutionBatchView } from '@shared/types/catalogue';
import type { SolutionAnswer } from '@shared/types/chemistry';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { ApiError } from '@/lib/api-client';
import type { SolutionParams } from '../api/chemistry-queries';
import { useSaveBatch } from '../api/save-batch';

/** The worked-out solution as a new batch: code, kind and date; the rest comes from it. */
export function SaveBatchForm({
  answer,
  asked,
}: {
  answer: SolutionAnswer;
  asked: SolutionParams;
}) {
  const save = useSaveBatch();
  const [code, setCode] = useState('');
  const [kind, setKind] = useState<BatchKind>(findChemical(answer.chemical)?.kind ?? 'fixer');
  const [madeOn, setMadeOn] = useState(todayIso());
  const [madeBy, setMadeBy] = useState('');
  const [saved, setSaved] = useState<SolutionBatchView | null>(null);
  const fieldError = (path: string) =>
    save.error instanceof ApiError
      ? save.error.errors.find((e) => e.path === path)?.message
      : undefined;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    save.mutate(
      {
        code,
        kind,
        chemical: answer.chemical,
        concentrationPercent: asked.percent,
        volumeMl: Math.round(asked.volumeMl * 10) / 10,
        madeOn: madeOn || null,
        madeBy: madeBy || null,
        notes: `Made with the solution maker: ${answer.grams.toFixed(2)} g of ${answer.chemical} made up to ${Math.round(asked.volumeMl * 10) / 10} ml (${answer.molarity.toFixed(4)} mol/L).`,
      },
      { onSuccess: setSaved },
    );
  };

  if (saved) {
    return (
      <p role="status" className="mt-4 rounded border border-ok bg-ok-light px-3 py-2 text-sm">
        Saved as batch <Link to={paths.batch(saved.id)}>{saved.code}</Link>. Name it in a print’s
        processing step to link the two.
      </p>
    );
  }
  return (
    <form
      noValidate
      onSubmit={submit}
      aria-labelledby="save-batch-heading"
      className="mt-4 grid gap-3 rounded border border-paper-edge bg-paper-deep/60 p-3 sm:grid-cols-2"
    >
      <h3 id="save-batch-heading" className="font-serif text-lg sm:col-span-2">
        Save as a batch
      </h3>
      <TextField
        label="Batch code"
        placeholder="e.g. FIX-26A"
        value={code}
        onChange={(e) => setCode(e.target.value)}
        error={fieldError('code')}
      />
      <SelectField
        label="Kind"
        options={(batchKindsFor(answer.chemical) ?? BATCH_KINDS).map((k) => ({
          value: k,
          label: k,
        }))}
        value={kind}
        onChange={(e) => setKind(e.target.value as BatchKind)}
        error={fieldError('kind')}
      />
      <DateField
        label="Made on"
        value={madeOn}
        onChange={(e) => setMadeOn(e.target.value)}
        error={fieldError('madeOn')}
      />
      <TextField label="Made by" value={madeBy} onChange={(e) => setMadeBy(e.target.value)} />
      <div className="flex items-center gap-2 sm:col-span-2">
        <Button type="submit" tone="primary" disabled={save.isPending}>
          {save.isPending ? 'Saving…' : 'Save as a batch'}
        </Button>
        {!(save.error instanceof ApiError && save.error.status === 422) && (
          <ErrorNotice error={save.error} />
        )}
      </div>
    </form>
  );
}
