import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { useNavigate, useParams } from 'react-router-dom';
import {
  ConditionReportCreateSchema,
  type ConditionReportCreate,
  type ConditionReportCreateInput,
} from '@shared/schemas/condition';
import { Button, ButtonLink } from '@/components/ui/button';
import { TextArea, TextField } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { showServerErrors } from '@/lib/server-errors';
import { useCreateConditionReport } from '../api/condition-queries';
import { printForCondition } from '../api/print-summary';
import { GradeField } from './grade-field';
import { ImageAttachments } from './image-attachments';
import { ObservationsEditor } from './observations-editor';

const today = () => new Date().toISOString().slice(0, 10);
const numeric = {
  setValueAs: (value: unknown) => (value === '' || value == null ? null : Number(value)),
};

/** A conservator's examination of one print, written on its own page. */
export function ConditionReportPage() {
  const printId = Number(useParams().id);
  const print = useQuery(printForCondition(printId));
  const navigate = useNavigate();
  const create = useCreateConditionReport(printId);
  const form = useForm<ConditionReportCreateInput, unknown, ConditionReportCreate>({
    resolver: zodResolver(ConditionReportCreateSchema),
    defaultValues: { reportedOn: today(), observations: [], images: [] },
  });
  const { register, handleSubmit, control, setError, formState } = form;
  const errors = formState.errors;

  if (print.isPending) return <Loading label="Loading the print…" />;
  if (print.error) return <ErrorNotice error={print.error} />;

  const submit = handleSubmit((values) =>
    create.mutate(values, {
      onSuccess: () => navigate(paths.print(printId)),
      onError: (error) => showServerErrors(error, setError),
    }),
  );

  return (
    <article>
      <PageHeader
        accession={print.data.accessionNumber}
        title={`Condition report · ${print.data.title}`}
      />
      <form onSubmit={submit} noValidate className="max-w-3xl space-y-6">
        <div className="grid gap-3 sm:grid-cols-3">
          <TextField
            label="Examined on"
            type="date"
            error={errors.reportedOn?.message}
            {...register('reportedOn')}
          />
          <TextField
            label="Room temperature (°C)"
            type="number"
            step="0.1"
            inputMode="decimal"
            error={errors.environment?.temperatureC?.message}
            {...register('environment.temperatureC', numeric)}
          />
          <TextField
            label="Relative humidity (%)"
            type="number"
            step="1"
            inputMode="decimal"
            error={errors.environment?.rh?.message}
            {...register('environment.rh', numeric)}
          />
        </div>
        <GradeField field={register('grade')} error={errors.grade?.message} />
        <ObservationsEditor control={control} register={register} errors={errors} />
        <ImageAttachments print={print.data} control={control} />
        <TextArea label="Notes" error={errors.notes?.message} {...register('notes')} />
        <TextArea
          label="Recommendation"
          rows={3}
          error={errors.recommendation?.message}
          {...register('recommendation')}
        />
        <ErrorNotice error={create.error} />
        <div className="flex gap-2">
          <Button type="submit" tone="primary" disabled={create.isPending}>
            {create.isPending ? 'Saving…' : 'Save condition report'}
          </Button>
          <ButtonLink to={paths.print(printId)}>Cancel</ButtonLink>
        </div>
      </form>
    </article>
  );
}
