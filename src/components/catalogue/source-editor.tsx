import { useState, type KeyboardEvent } from 'react';
import { SOURCE_KINDS } from '@shared/domain/registrar/vocabulary';
import { SourceSchema, type SourceInput } from '@shared/schemas/registrar';
import type { SourceView } from '@shared/types/registrar';
import { Button } from '@/components/ui/button';
import { SelectField, TextArea, TextField } from '@/components/ui/field';
import { ErrorNotice } from '@/components/ui/notices';
import { ApiError } from '@/lib/api-client';
import { useSaveSource } from '@/lib/sources-api';

const KIND_WORDS: Record<SourceInput['kind'], string> = {
  person: 'A person',
  organisation: 'An organisation',
};

/**
 * A source's name, kind and contact, saved on its own. Not a <form>: the print form holds
 * one for a new donor, so Enter in its fields saves the source, not the print.
 */
export function SourceEditor({
  source,
  label,
  onSaved,
  onCancel,
}: {
  source?: SourceView;
  label: string;
  onSaved: (source: SourceView) => void;
  onCancel: () => void;
}) {
  const save = useSaveSource();
  const [values, setValues] = useState<SourceInput>({
    name: source?.name ?? '',
    kind: source?.kind ?? 'person',
    contact: source?.contact ?? '',
  });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const submit = () => {
    const checked = SourceSchema.safeParse(values);
    if (!checked.success) {
      setErrors(Object.fromEntries(checked.error.issues.map((i) => [i.path.join('.'), i.message])));
      return;
    }
    setErrors({});
    save.mutate(
      { id: source?.id, body: checked.data },
      {
        onSuccess: onSaved,
        onError: (error) => {
          if (error instanceof ApiError)
            setErrors(Object.fromEntries(error.errors.map((e) => [e.path, e.message])));
        },
      },
    );
  };
  const onKeyDown = (event: KeyboardEvent) => {
    if (event.key === 'Enter' && !(event.target instanceof HTMLTextAreaElement)) {
      event.preventDefault();
      submit();
    }
  };
  return (
    <div
      role="group"
      aria-label={label}
      onKeyDown={onKeyDown}
      className="grid gap-3 rounded border border-paper-edge bg-white/60 p-3 sm:grid-cols-2"
    >
      <TextField
        label="Name"
        value={values.name}
        onChange={(event) => setValues((v) => ({ ...v, name: event.target.value }))}
        error={errors.name}
      />
      <SelectField
        label="Kind"
        value={values.kind}
        options={SOURCE_KINDS.map((kind) => ({ value: kind, label: KIND_WORDS[kind] }))}
        onChange={(event) =>
          setValues((v) => ({ ...v, kind: event.target.value as SourceInput['kind'] }))
        }
        error={errors.kind}
      />
      <TextArea
        label="Contact (archivists and admins only)"
        rows={2}
        className="sm:col-span-2"
        value={values.contact ?? ''}
        onChange={(event) => setValues((v) => ({ ...v, contact: event.target.value }))}
        error={errors.contact}
      />
      <div className="flex flex-wrap items-center gap-2 sm:col-span-2">
        <Button tone="primary" onClick={submit} disabled={save.isPending}>
          {save.isPending ? 'Saving…' : source ? 'Save source' : 'Add source'}
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
        {!(save.error instanceof ApiError && save.error.errors.length > 0) && (
          <ErrorNotice error={save.error} />
        )}
      </div>
    </div>
  );
}
