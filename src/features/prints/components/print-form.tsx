import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { Controller, useForm, useWatch, type UseFormSetError } from 'react-hook-form';
import { PRINT_STATUSES, PROCESSES } from '@shared/domain/vocabulary';
import { PrintCreateSchema, type PrintCreate, type PrintCreateInput } from '@shared/schemas/print';
import type {
  LocationView,
  NegativeView,
  PaperView,
  SolutionBatchView,
} from '@shared/types/catalogue';
import { Button } from '@/components/ui/button';
import { SelectField, TextArea, TextField } from '@/components/ui/field';
import { ChemicalCaution, ErrorNotice, Loading } from '@/components/ui/notices';
import { ApiError } from '@/lib/api-client';
import { referenceQueries } from '@/lib/reference-api';
import { useCan } from '@/lib/session';
import { asNumber } from './form-values';
import { StepsEditor } from './steps-editor';
import { TagsField } from './tags-field';

interface PrintFormProps {
  defaultValues: PrintCreateInput;
  submitLabel: string;
  pending: boolean;
  error: unknown;
  onSubmit: (values: PrintCreate, setError: UseFormSetError<PrintCreateInput>) => void;
}

type SizeName = 'imageWidthMm' | 'imageHeightMm' | 'sheetWidthMm' | 'sheetHeightMm';

interface Lists {
  papers: PaperView[];
  negatives: NegativeView[];
  places: LocationView[] | null;
  batches: SolutionBatchView[];
}

/**
 * The whole catalogue record with its processing history; used to create and to edit.
 * The linked lists load first: a select given its value before its options shows the wrong one.
 */
export function PrintForm(props: PrintFormProps) {
  const can = useCan();
  const papers = useQuery(referenceQueries.papers());
  const negatives = useQuery(referenceQueries.negatives());
  const batches = useQuery(referenceQueries.batches());
  const places = useQuery({ ...referenceQueries.locations(), enabled: can('locations:read') });
  const queries = [papers, negatives, batches, ...(can('locations:read') ? [places] : [])];
  const failed = queries.find((query) => query.error)?.error;
  if (failed) return <ErrorNotice error={failed} />;
  if (!papers.data || !negatives.data || !batches.data || (can('locations:read') && !places.data)) {
    return <Loading label="Loading papers, negatives and places…" />;
  }
  const lists = {
    papers: papers.data,
    negatives: negatives.data,
    batches: batches.data,
    places: places.data ?? null,
  };
  return <PrintFormFields {...props} lists={lists} />;
}

function PrintFormFields({
  defaultValues,
  submitLabel,
  pending,
  error,
  onSubmit,
  lists,
}: PrintFormProps & { lists: Lists }) {
  const form = useForm<PrintCreateInput, unknown, PrintCreate>({
    resolver: zodResolver(PrintCreateSchema),
    defaultValues,
  });
  const { register, control, formState } = form;
  const errors = formState.errors;
  const numeric = { setValueAs: asNumber };
  const steps = useWatch({ control, name: 'processing' });
  const sizeField = (name: SizeName, label: string) => (
    <TextField
      label={label}
      type="number"
      step="any"
      inputMode="decimal"
      {...register(name, numeric)}
      error={errors[name]?.message}
    />
  );

  return (
    <form
      noValidate
      onSubmit={form.handleSubmit((values) => onSubmit(values, form.setError))}
      className="flex flex-col gap-6"
    >
      <fieldset className="grid gap-3 rounded border border-paper-edge p-3 md:grid-cols-3">
        <legend className="px-1 font-serif text-xl">The print</legend>
        <TextField
          label="Title"
          className="md:col-span-2"
          {...register('title')}
          error={errors.title?.message}
        />
        <TextField
          label="Accession number"
          placeholder="assigned when left empty"
          {...register('accessionNumber', { setValueAs: (v) => v || undefined })}
          error={errors.accessionNumber?.message}
        />
        <TextField label="Maker" {...register('maker')} error={errors.maker?.message} />
        <TextField
          label="Made"
          hint="2026-05-14, 2026-05, 2026, c. 2026, 2024–2026 or 2020s"
          {...register('madeOn')}
          error={errors.madeOn?.message}
        />
        <SelectField
          label="Process"
          options={PROCESSES.map((p) => ({ value: p, label: p }))}
          {...register('process')}
          error={errors.process?.message}
        />
        <SelectField
          label="Paper"
          placeholder="Not recorded"
          options={lists.papers.map((p) => ({ value: p.id, label: p.name }))}
          {...register('paperId', numeric)}
          error={errors.paperId?.message}
        />
        <SelectField
          label="Negative"
          placeholder="Not recorded"
          options={lists.negatives.map((n) => ({
            value: n.id,
            label: `${n.code}${n.subject ? ` · ${n.subject}` : ''}`,
          }))}
          {...register('negativeId', numeric)}
          error={errors.negativeId?.message}
        />
        {lists.places && (
          <SelectField
            label="Place"
            placeholder="Not recorded"
            options={lists.places.map((l) => ({ value: l.id, label: l.path }))}
            {...register('locationId', numeric)}
            error={errors.locationId?.message}
          />
        )}
        {sizeField('imageWidthMm', 'Image width (mm)')}
        {sizeField('imageHeightMm', 'Image height (mm)')}
        <TextField
          label="Edition or impression"
          {...register('edition')}
          error={errors.edition?.message}
        />
        {sizeField('sheetWidthMm', 'Sheet width (mm)')}
        {sizeField('sheetHeightMm', 'Sheet height (mm)')}
        <SelectField
          label="Status"
          options={PRINT_STATUSES.map((s) => ({ value: s, label: s }))}
          {...register('status')}
          error={errors.status?.message}
        />
        <TextArea
          label="Description"
          className="md:col-span-3"
          {...register('description')}
          error={errors.description?.message}
        />
        <Controller
          control={control}
          name="tags"
          render={({ field }) => (
            <TagsField value={field.value} onChange={field.onChange} error={errors.tags?.message} />
          )}
        />
      </fieldset>
      <StepsEditor
        control={control}
        register={register}
        setValue={form.setValue}
        errors={errors}
        batches={lists.batches}
      />
      <ChemicalCaution chemicals={steps?.map((step) => step.chemical ?? null)} />
      <FormFooter
        pending={pending}
        error={error}
        submitLabel={submitLabel}
        invalid={Object.keys(errors).length > 0}
      />
    </form>
  );
}

export function FormFooter({
  pending,
  error,
  submitLabel,
  invalid,
}: {
  pending: boolean;
  error: unknown;
  submitLabel: string;
  invalid: boolean;
}) {
  return (
    <div className="sticky bottom-0 flex flex-wrap items-center gap-3 border-t border-paper-edge bg-paper/95 py-3">
      <Button type="submit" tone="primary" disabled={pending}>
        {pending ? 'Saving…' : submitLabel}
      </Button>
      {invalid && (
        <p role="alert" className="text-sm text-alert">
          Some fields need correcting; see the messages beside them.
        </p>
      )}
      {!(error instanceof ApiError && error.status === 422) && <ErrorNotice error={error} />}
    </div>
  );
}
