import { zodResolver } from '@hookform/resolvers/zod';
import { todayIso } from '@shared/domain/tone/check-date';
import { useQuery } from '@tanstack/react-query';
import { useForm, type DefaultValues } from 'react-hook-form';
import { useNavigate, useParams } from 'react-router-dom';
import {
  ConditionReportCreateSchema,
  type ConditionReportCreate,
  type ConditionReportCreateInput,
} from '@shared/schemas/condition';
import { Button, ButtonLink } from '@/components/ui/button';
import { TextArea, TextField } from '@/components/ui/field';
import { DateField } from '@/components/ui/date-field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { showServerErrors } from '@/lib/server-errors';
import type { PrintView } from '@shared/types/catalogue';
import type { ConditionReportView } from '@shared/types/condition';
import { ApiError } from '@/lib/api-client';
import {
  conditionQueries,
  useCreateConditionReport,
  useUpdateConditionReport,
} from '../api/condition-queries';
import { printForCondition } from '../api/print-summary';
import { GradeField } from './grade-field';
import { ImageAttachments } from './image-attachments';
import { ObservationsEditor } from './observations-editor';

const numeric = {
  setValueAs: (value: unknown) => (value === '' || value == null ? null : Number(value)),
};

/** A conservator's examination of one print, written (or corrected) on its own page. */
export function ConditionReportPage() {
  const params = useParams();
  const printId = Number(params.id);
  const reportId = params.reportId ? Number(params.reportId) : null;
  const print = useQuery(printForCondition(printId));
  const reports = useQuery({ ...conditionQueries.reports(printId), enabled: reportId !== null });
  if (print.isPending || (reportId !== null && reports.isPending))
    return <Loading label="Loading the print…" />;
  if (print.error || reports.error) return <ErrorNotice error={print.error ?? reports.error} />;
  const report = reports.data?.items.find((item) => item.id === reportId);
  if (reportId !== null && !report)
    return <ErrorNotice error={new ApiError(404, 'No such condition report', '')} />;
  return <ReportForm print={print.data} report={report ?? null} />;
}

function defaultsOf(report: ConditionReportView | null): DefaultValues<ConditionReportCreateInput> {
  if (!report) return { reportedOn: todayIso(), observations: [], images: [] };
  return {
    reportedOn: report.reportedOn,
    grade: report.grade ?? undefined,
    observations: report.observations,
    notes: report.notes,
    recommendation: report.recommendation,
    environment: report.environment,
    images: report.images.map(({ assetId, area, caption }) => ({ assetId, area, caption })),
  };
}

function ReportForm({ print, report }: { print: PrintView; report: ConditionReportView | null }) {
  const printId = print.id;
  const navigate = useNavigate();
  const create = useCreateConditionReport(printId);
  const update = useUpdateConditionReport(report?.id ?? 0);
  const save = report ? update : create;
  const form = useForm<ConditionReportCreateInput, unknown, ConditionReportCreate>({
    resolver: zodResolver(ConditionReportCreateSchema),
    defaultValues: defaultsOf(report),
  });
  const { register, handleSubmit, control, setError, formState } = form;
  const errors = formState.errors;

  const submit = handleSubmit((values) =>
    save.mutate(values, {
      onSuccess: () => navigate(paths.print(printId)),
      onError: (error) => showServerErrors(error, setError),
    }),
  );

  return (
    <article>
      <PageHeader
        accession={print.accessionNumber}
        title={`${report ? 'Correct the condition report' : 'Condition report'} · ${print.title}`}
      />
      <form onSubmit={submit} noValidate className="max-w-3xl space-y-6">
        <div className="grid gap-3 sm:grid-cols-3">
          <DateField
            label="Examined on"
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
        <ImageAttachments print={print} control={control} />
        <TextArea label="Notes" error={errors.notes?.message} {...register('notes')} />
        <TextArea
          label="Recommendation"
          rows={3}
          error={errors.recommendation?.message}
          {...register('recommendation')}
        />
        <ErrorNotice error={save.error} />
        <div className="flex gap-2">
          <Button type="submit" tone="primary" disabled={save.isPending}>
            {save.isPending ? 'Saving…' : report ? 'Save the correction' : 'Save condition report'}
          </Button>
          <ButtonLink to={paths.print(printId)}>Cancel</ButtonLink>
        </div>
      </form>
    </article>
  );
}
