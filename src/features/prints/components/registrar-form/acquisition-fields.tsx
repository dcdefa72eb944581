import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { useWatch } from 'react-hook-form';
import { ACQUISITION_METHODS } from '@shared/domain/registrar/vocabulary';
import { Button } from '@/components/ui/button';
import { SelectField, TextArea, TextField } from '@/components/ui/field';
import { paths } from '@/config/paths';
import { sourceQueries } from '@/lib/sources-api';
import { asNumber } from '../form-values';
import { DATE_HINT, legendClass, sectionClass, type RegistrarFormParts } from './types';

const METHOD_OPTIONS = ACQUISITION_METHODS.map((method) => ({ value: method, label: method }));

/** How the print came in: method, source, date, agreement, credit line and price. */
export function AcquisitionFields({ control, register, setValue, errors }: RegistrarFormParts) {
  const acquisition = useWatch({ control, name: 'acquisition' });
  const sources = useQuery(sourceQueries.list());
  const problems = errors.acquisition;
  const options = { shouldDirty: true };
  if (!acquisition) {
    return (
      <fieldset className={sectionClass}>
        <legend className={legendClass}>How it came in</legend>
        <p className="text-sm text-ink-faint md:col-span-2">Not recorded.</p>
        <Button
          onClick={() =>
            setValue('acquisition', { method: 'gift', acquiredOn: '' } as never, options)
          }
        >
          + Record how it came in
        </Button>
      </fieldset>
    );
  }
  const sourceOptions = (sources.data ?? []).map((source) => ({
    value: source.id,
    label: `${source.name} (${source.kind})`,
  }));
  return (
    <fieldset className={sectionClass}>
      <legend className={legendClass}>How it came in</legend>
      <SelectField
        label="How"
        options={METHOD_OPTIONS}
        {...register('acquisition.method')}
        error={problems?.method?.message}
      />
      {/* A select given its value before its options would show the wrong one. */}
      {sources.data ? (
        <SelectField
          label="Source"
          placeholder={'Choose a source'}
          options={sourceOptions}
          hint={
            <>
              Not in the list?{' '}
              <Link to={paths.sources} target="_blank" className="underline">
                Add it on the Sources page
              </Link>{' '}
              (opens in a new tab), then come back; the list refreshes.
            </>
          }
          {...register('acquisition.sourceId', { setValueAs: asNumber })}
          error={problems?.sourceId?.message}
        />
      ) : (
        <p className="text-sm text-ink-faint">
          {sources.error
            ? `Sources could not be loaded: ${sources.error.message}`
            : 'Loading sources…'}
        </p>
      )}
      <TextField
        label="When"
        hint={DATE_HINT}
        autoComplete="off"
        {...register('acquisition.acquiredOn')}
        error={problems?.acquiredOn?.message}
      />
      <TextField
        label="Agreement reference"
        autoComplete="off"
        {...register('acquisition.reference')}
        error={problems?.reference?.message}
      />
      <TextField
        label="Price paid"
        hint="Seen only by archivists and admins"
        inputMode="decimal"
        autoComplete="off"
        {...register('acquisition.price', { setValueAs: asNumber })}
        error={problems?.price?.message}
      />
      <div className="flex items-end">
        <Button tone="danger" onClick={() => setValue('acquisition', null, options)}>
          Clear how it came in
        </Button>
      </div>
      <TextArea
        label="Credit line"
        rows={2}
        className="md:col-span-3"
        hint="Printed beside the print, e.g. “Gift of …, 2024”"
        {...register('acquisition.creditLine')}
        error={problems?.creditLine?.message}
      />
    </fieldset>
  );
}
