import { zodResolver } from '@hookform/resolvers/zod';
import { Controller, useForm } from 'react-hook-form';
import { PrintFieldsSchema } from '@shared/schemas/print';
import type { PrintView } from '@shared/types/catalogue';
import type { z } from 'zod';
import { TextArea, TextField } from '@/components/ui/field';
import { CLEAR_OF_FOOTER, FormFooter } from './print-form';
import { showServerErrors } from '@/lib/server-errors';
import { useUnsavedChanges } from '@/lib/unsaved-changes';
import { TagsField } from './tags-field';

/** What a curator may change: the same rules as the full record, three fields of it. */
const CuratorialSchema = PrintFieldsSchema.pick({ title: true, description: true, tags: true });
type CuratorialInput = z.input<typeof CuratorialSchema>;
type Curatorial = z.output<typeof CuratorialSchema>;

export function CuratorialForm({
  print,
  pending,
  error,
  onSubmit,
}: {
  print: PrintView;
  pending: boolean;
  error: unknown;
  onSubmit: (
    values: Curatorial,
    handlers: { onError: (error: unknown) => void; beforeLeave: () => void },
  ) => void;
}) {
  const form = useForm<CuratorialInput, unknown, Curatorial>({
    resolver: zodResolver(CuratorialSchema),
    defaultValues: { title: print.title, description: print.description, tags: print.tags },
  });
  const errors = form.formState.errors;
  const guard = useUnsavedChanges(form.formState.isDirty);
  return (
    <form
      noValidate
      onSubmit={form.handleSubmit((values) =>
        onSubmit(values, {
          onError: (e) => showServerErrors(e, form.setError),
          beforeLeave: guard.release,
        }),
      )}
      className={`flex max-w-2xl flex-col gap-3 ${CLEAR_OF_FOOTER}`}
    >
      {guard.dialog}
      <TextField label="Title" {...form.register('title')} error={errors.title?.message} />
      <TextArea
        label="Description"
        rows={8}
        {...form.register('description')}
        error={errors.description?.message}
      />
      <Controller
        control={form.control}
        name="tags"
        render={({ field }) => (
          <TagsField value={field.value} onChange={field.onChange} error={errors.tags?.message} />
        )}
      />
      <FormFooter
        pending={pending}
        error={error}
        submitLabel="Save"
        invalid={Object.keys(errors).length > 0}
      />
    </form>
  );
}
