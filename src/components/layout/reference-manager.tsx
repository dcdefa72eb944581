import { zodResolver } from '@hookform/resolvers/zod';
import type { UseQueryResult } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { useForm, type FieldValues } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { SelectField, TextField } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { ApiError } from '@/lib/api-client';
import { showServerErrors } from '@/lib/server-errors';
import { useReferenceMutation } from '@/lib/reference-api';

export interface FieldSpec {
  name: string;
  label: string;
  kind?: 'text' | 'number' | 'select' | 'date';
  options?: ReadonlyArray<{ value: string | number; label: string }>;
  placeholder?: string;
}

export interface ColumnSpec<T> {
  label: string;
  render: (item: T) => ReactNode;
}

type Resource = Parameters<typeof useReferenceMutation>[0];

/** A reference list: a dense table, and for those allowed, add, edit and delete. */
export function ReferenceManager<T extends { id: number }>({
  path,
  noun,
  list,
  order,
  columns,
  fields,
  schema,
  canEdit,
  toForm,
}: {
  path: Resource;
  noun: string;
  /** The list's query; loading and failure are shown here, once for every list. */
  list: UseQueryResult<T[]>;
  order?: (a: T, b: T) => number;
  columns: ColumnSpec<T>[];
  fields: FieldSpec[];
  schema: z.ZodType<FieldValues, FieldValues>;
  canEdit: boolean;
  toForm: (item: T) => FieldValues;
}) {
  const [editing, setEditing] = useState<T | 'new' | null>(null);
  const [deleting, setDeleting] = useState<T | null>(null);
  const mutation = useReferenceMutation<FieldValues>(path);
  if (list.error) return <ErrorNotice error={list.error} />;
  if (!list.data) return <Loading />;
  const items = order ? [...list.data].sort(order) : list.data;

  return (
    <div className="flex flex-col gap-4">
      {canEdit && editing === null && (
        <div>
          <Button tone="primary" onClick={() => setEditing('new')}>
            Add {noun}
          </Button>
        </div>
      )}
      {editing !== null && (
        <ReferenceForm
          key={editing === 'new' ? 'new' : editing.id}
          title={editing === 'new' ? `New ${noun}` : `Edit ${noun}`}
          fields={fields}
          schema={schema}
          defaultValues={editing === 'new' ? {} : toForm(editing)}
          onCancel={() => setEditing(null)}
          onSave={(body, onError) =>
            mutation.mutate(
              { id: editing === 'new' ? undefined : editing.id, body },
              { onSuccess: () => setEditing(null), onError },
            )
          }
          pending={mutation.isPending}
        />
      )}
      {deleting && (
        <div
          role="alertdialog"
          aria-label={`Delete ${noun}`}
          className="flex flex-wrap items-center gap-2 rounded border border-alert bg-alert-light px-3 py-2 text-sm"
        >
          Delete this {noun}? Records that use it keep nothing of it; in-use ones are refused.
          <Button
            tone="danger"
            onClick={() =>
              mutation.mutate(
                { id: deleting.id, remove: true },
                { onSettled: () => setDeleting(null) },
              )
            }
          >
            Yes, delete
          </Button>
          <Button onClick={() => setDeleting(null)}>Keep</Button>
        </div>
      )}
      {!editing && <ErrorNotice error={mutation.error} />}
      <div className="relative overflow-x-auto rounded border border-paper-edge bg-white/60">
        <table className="w-full border-collapse text-sm">
          <thead className="bg-paper-deep text-left text-xs tracking-wide text-ink-soft uppercase">
            <tr>
              {columns.map((column) => (
                <th key={column.label} scope="col" className="px-3 py-2 font-semibold">
                  {column.label}
                </th>
              ))}
              {canEdit && (
                <th scope="col" className="px-3 py-2">
                  <span className="sr-only">Actions</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {items.map((item) => (
              <tr key={item.id} className="border-t border-paper-edge/70">
                {columns.map((column) => (
                  <td key={column.label} className="px-3 py-1.5">
                    {column.render(item)}
                  </td>
                ))}
                {canEdit && (
                  <td className="px-3 py-1.5 text-right whitespace-nowrap">
                    <Button onClick={() => setEditing(item)}>Edit</Button>{' '}
                    <Button tone="danger" onClick={() => setDeleting(item)}>
                      Delete
                    </Button>
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}

function ReferenceForm({
  title,
  fields,
  schema,
  defaultValues,
  onSave,
  onCancel,
  pending,
}: {
  title: string;
  fields: FieldSpec[];
  schema: z.ZodType<FieldValues, FieldValues>;
  defaultValues: FieldValues;
  onSave: (body: FieldValues, onError: (error: unknown) => void) => void;
  onCancel: () => void;
  pending: boolean;
}) {
  const form = useForm<FieldValues>({ resolver: zodResolver(schema), defaultValues });
  const [failure, setFailure] = useState<unknown>(null);
  const onError = (error: unknown) => {
    setFailure(error);
    showServerErrors(error, form.setError);
  };
  const message = (name: string) => form.formState.errors[name]?.message as string | undefined;
  return (
    <form
      noValidate
      onSubmit={form.handleSubmit((body) => onSave(body, onError))}
      className="rounded border border-paper-edge bg-paper-deep/60 p-3"
    >
      <h2 className="mb-2 text-xl">{title}</h2>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
        {fields.map((field) =>
          field.kind === 'select' ? (
            <SelectField
              key={field.name}
              label={field.label}
              options={field.options ?? []}
              placeholder={field.placeholder}
              {...form.register(field.name, {
                setValueAs: (v) =>
                  v === ''
                    ? null
                    : /^\d+$/.test(String(v)) && field.name.endsWith('Id')
                      ? Number(v)
                      : v,
              })}
              error={message(field.name)}
            />
          ) : (
            <TextField
              key={field.name}
              label={field.label}
              type={field.kind === 'number' || field.kind === 'date' ? field.kind : 'text'}
              step="any"
              {...form.register(
                field.name,
                field.kind === 'number'
                  ? { setValueAs: (v) => (v === '' || v == null ? null : Number(v)) }
                  : field.kind === 'date'
                    ? { setValueAs: (v) => (v === '' || v == null ? null : v) }
                    : {},
              )}
              error={message(field.name)}
            />
          ),
        )}
      </div>
      <div className="mt-3 flex items-center gap-2">
        <Button type="submit" tone="primary" disabled={pending}>
          {pending ? 'Saving…' : 'Save'}
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
        {!(failure instanceof ApiError && failure.status === 422) && (
          <ErrorNotice error={failure} />
        )}
      </div>
    </form>
  );
}
