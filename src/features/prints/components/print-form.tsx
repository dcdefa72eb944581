import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import type { AssetRecord } from '@shared/types/asset';
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
import { showServerErrors } from '@/lib/server-errors';
import { useCan } from '@/lib/session';
import { formDraft, useUnsavedChanges } from '@/lib/unsaved-changes';
import { asNumber } from './form-values';
import { RegistrarFields } from './registrar-form/registrar-fields';
import { StepsEditor } from './steps-editor';
import { TagsField } from './tags-field';
import { useOneAtATime } from '@/lib/use-one-at-a-time';

interface PrintFormProps {
  defaultValues: PrintCreateInput;
  submitLabel: string;
  pending: boolean;
  error: unknown;
  /** Where this form's unsaved draft is kept in the tab ("new", or the print's id). */
  draftKey: string;
  /** Sends the values; rejects with the server's problem (shown beside the fields). */
  save: (values: PrintCreate) => Promise<{ id: number }>;
  /** After a save: the draft is gone and leaving the page is no longer asked about. */
  onSaved: (saved: { id: number }) => void;
  /** The print's photographs (editing): a mark can be placed on one of them. */
  photographs?: AssetRecord[];
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
  draftKey,
  save,
  onSaved,
  lists,
  photographs = [],
}: PrintFormProps & { lists: Lists }) {
  // The values the form opened with (a parent's later renders may pass a new object).
  const [initial] = useState(defaultValues);
  const form = useForm<PrintCreateInput, unknown, PrintCreate>({
    resolver: zodResolver(PrintCreateSchema),
    defaultValues: initial,
  });
  const { register, control, formState } = form;
  const draft = useMemo(() => formDraft<PrintCreateInput>(`print:${draftKey}`), [draftKey]);
  // A draft left in this tab (Back, then Forward) comes back as unsaved changes.
  const [kept] = useState(() => {
    const value = draft.read();
    return value && JSON.stringify(value) !== JSON.stringify(initial) ? value : null;
  });
  const [restored, setRestored] = useState(kept !== null);
  const guard = useUnsavedChanges(formState.isDirty, { keptAsDraft: true });

  useEffect(() => {
    if (kept) form.reset(kept, { keepDefaultValues: true });
    return form.subscribe({
      formState: { values: true },
      callback: ({ values }) => draft.write(values),
    });
  }, [draft, form, kept]);

  const discard = () => {
    draft.clear();
    form.reset(initial);
    setRestored(false);
  };
  const oneAtATime = useOneAtATime();
  const submit = oneAtATime(async (values: PrintCreate) => {
    try {
      const saved = await save(values);
      guard.release();
      draft.clear();
      onSaved(saved);
    } catch (problem) {
      showServerErrors(problem, form.setError);
    }
  });
  const errors = formState.errors;
  const numeric = { setValueAs: asNumber };
  const steps = useWatch({ control, name: 'processing' });
  const sizeField = (name: SizeName, label: string) => (
    <TextField
      label={label}
      inputMode="decimal"
      autoComplete="off"
      {...register(name, numeric)}
      error={errors[name]?.message}
    />
  );

  return (
    <form
      noValidate
      onSubmit={form.handleSubmit(submit)}
      className={`flex flex-col gap-6 ${CLEAR_OF_FOOTER}`}
    >
      {guard.dialog}
      {restored && (
        <div
          role="status"
          className="flex flex-wrap items-center gap-3 rounded border border-gall/40 bg-gall-light px-3 py-2 text-sm"
        >
          <span>Your unsaved changes from earlier are back in the form.</span>
          <Button onClick={discard}>Discard them</Button>
        </div>
      )}
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
      <RegistrarFields
        control={control}
        register={register}
        setValue={form.setValue}
        errors={errors}
        photographs={photographs}
      />
      <FormFooter
        pending={pending}
        error={error}
        submitLabel={submitLabel}
        invalid={Object.keys(errors).length > 0}
      />
    </form>
  );
}

/**
 * For the form that holds a `FormFooter`: a browser bringing a focused control into view
 * often scrolls only until its bottom meets the window's bottom edge, where the sticky bar
 * would cover it. A bottom scroll margin on every control (8rem: the bar is about 4rem
 * tall, twice that when its notice wraps on a phone) keeps them in view above it. A control
 * already partly in view is not scrolled at all; for that, the page's scroll padding leaves
 * the bar's strip out of what counts as in view (`index.css`, `[data-save-bar]`).
 */
export const CLEAR_OF_FOOTER = '[&_*]:scroll-mb-32';

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
    <div
      data-save-bar
      className="sticky bottom-0 flex flex-wrap items-center gap-3 border-t border-paper-edge bg-paper/95 py-3"
    >
      <Button type="submit" tone="primary" disabled={pending}>
        {pending ? 'Saving…' : submitLabel}
      </Button>
      {invalid && (
        <p role="alert" className="text-sm text-alert">
          Some fields need correcting; see the messages beside them.
        </p>
      )}
      {!hasFieldProblems(error) && <ErrorNotice error={error} />}
    </div>
  );
}

/**
 * A refusal whose problems name fields (a 422, or a 409 for a number already in use) is
 * shown beside those fields; the general words would only repeat it, and would stay after
 * the fields were corrected.
 */
function hasFieldProblems(error: unknown): boolean {
  return error instanceof ApiError && (error.status === 422 || error.errors.length > 0);
}
