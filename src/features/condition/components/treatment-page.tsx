import { zodResolver } from '@hookform/resolvers/zod';
import { todayIso } from '@shared/domain/tone/check-date';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { useNavigate, useParams } from 'react-router-dom';
import {
  TreatmentCreateSchema,
  type TreatmentCreate,
  type TreatmentCreateInput,
} from '@shared/schemas/condition';
import { Button, ButtonLink } from '@/components/ui/button';
import { TextArea, TextField } from '@/components/ui/field';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { showServerErrors } from '@/lib/server-errors';
import { useCreateTreatment } from '../api/condition-queries';
import { printForCondition } from '../api/print-summary';
import { TreatmentImages } from './treatment-images';

/** What a conservator did to a print, with what, and its before and after photographs. */
export function TreatmentPage() {
  const printId = Number(useParams().id);
  const print = useQuery(printForCondition(printId));
  const navigate = useNavigate();
  const create = useCreateTreatment(printId);
  const form = useForm<TreatmentCreateInput, unknown, TreatmentCreate>({
    resolver: zodResolver(TreatmentCreateSchema),
    defaultValues: { treatedOn: todayIso(), action: '' },
  });
  const { register, handleSubmit, setError, formState, control } = form;
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
        title={`Treatment · ${print.data.title}`}
      />
      <form onSubmit={submit} noValidate className="max-w-3xl space-y-4">
        <DateField
          label="Treated on"
          className="max-w-xs"
          error={errors.treatedOn?.message}
          {...register('treatedOn')}
        />
        <TextField
          label="Action"
          error={errors.action?.message}
          hint="What was done, e.g. surface cleaned, tear repaired, rehoused"
          {...register('action')}
        />
        <TextArea
          label="Materials"
          rows={2}
          error={errors.materials?.message}
          {...register('materials')}
        />
        <TextArea label="Notes" error={errors.notes?.message} {...register('notes')} />
        <TreatmentImages print={print.data} control={control} />
        <ErrorNotice error={create.error} />
        <div className="flex gap-2">
          <Button type="submit" tone="primary" disabled={create.isPending}>
            {create.isPending ? 'Saving…' : 'Save treatment'}
          </Button>
          <ButtonLink to={paths.print(printId)}>Cancel</ButtonLink>
        </div>
      </form>
    </article>
  );
}
