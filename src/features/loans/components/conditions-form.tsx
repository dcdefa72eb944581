import type { LoanView } from '@shared/types/loan';
import { useState, type FormEvent } from 'react';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import type { useUpdateLoan } from '../api/loan-queries';

type Band = { min: number; max: number } | null;

const numberOrNull = (value: FormDataEntryValue | null) =>
  value === null || String(value).trim() === '' ? null : Number(value);

/** Both ends, or neither (no band agreed); one end alone is a mistake to say. */
function bandOf(data: FormData, name: string): Band | 'half' {
  const min = numberOrNull(data.get(`${name}Min`));
  const max = numberOrNull(data.get(`${name}Max`));
  if (min === null && max === null) return null;
  if (min === null || max === null) return 'half';
  return { min, max };
}

/** A band's two ends, read back by `bandOf(data, name)`. */
function BandFields({
  label,
  unit,
  name,
  band,
}: {
  label: string;
  unit: string;
  name: string;
  band: Band | undefined;
}) {
  return (
    <>
      {(['min', 'max'] as const).map((end) => (
        <TextField
          key={end}
          label={`${label} ${end === 'min' ? 'from' : 'to'} (${unit})`}
          name={`${name}${end === 'min' ? 'Min' : 'Max'}`}
          type="number"
          step="any"
          defaultValue={band?.[end] ?? ''}
        />
      ))}
    </>
  );
}

/**
 * The agreed conditions, changed by a conservator or an admin. A change takes the signature
 * off: the changed conditions are signed again before the loan goes ahead.
 */
export function ConditionsForm({
  loan,
  update,
}: {
  loan: LoanView;
  update: ReturnType<typeof useUpdateLoan>;
}) {
  const [mistake, setMistake] = useState<string | null>(null);
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const temperatureC = bandOf(data, 'temperature');
    const humidityPercent = bandOf(data, 'humidity');
    if (temperatureC === 'half' || humidityPercent === 'half') {
      setMistake('Give both ends of a band, or leave both empty.');
      return;
    }
    setMistake(null);
    update.mutate({
      maxLux: numberOrNull(data.get('maxLux')) ?? Number.NaN,
      maxUv: numberOrNull(data.get('maxUv')),
      temperatureC,
      humidityPercent,
    });
  };
  return (
    <details className="mt-3 max-w-xl">
      <summary className="cursor-pointer text-sm">Change the conditions</summary>
      <form
        aria-label="Agreed conditions"
        className="mt-2 grid gap-2 sm:grid-cols-2"
        onSubmit={submit}
      >
        <TextField
          label="Illuminance at most (lx)"
          name="maxLux"
          type="number"
          step="any"
          min="0"
          required
          defaultValue={loan.maxLux}
        />
        <TextField
          label="Ultraviolet at most (µW/lm)"
          name="maxUv"
          type="number"
          step="any"
          min="0"
          defaultValue={loan.maxUv ?? ''}
        />
        <BandFields label="Temperature" unit="°C" name="temperature" band={loan.temperatureC} />
        <BandFields
          label="Relative humidity"
          unit="%"
          name="humidity"
          band={loan.humidityPercent}
        />
        <p className="text-xs text-ink-soft sm:col-span-2">
          Saving a change takes the signature off: the conditions are signed again afterwards.
        </p>
        {mistake && (
          <p role="alert" className="text-sm text-alert sm:col-span-2">
            {mistake}
          </p>
        )}
        <ErrorNotice error={update.error} className="sm:col-span-2" />
        <Button
          type="submit"
          tone="primary"
          disabled={update.isPending}
          className="sm:col-span-2 sm:justify-self-start"
        >
          {update.isPending ? 'Saving…' : 'Save the conditions'}
        </Button>
      </form>
    </details>
  );
}
