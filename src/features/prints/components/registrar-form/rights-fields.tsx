import { useWatch } from 'react-hook-form';
import { RIGHTS_STATEMENTS } from '@shared/domain/registrar/rights-statements';
import { Button } from '@/components/ui/button';
import { SelectField, TextArea, TextField } from '@/components/ui/field';
import { legendClass, sectionClass, type RegistrarFormParts } from './types';

const STATEMENT_OPTIONS = RIGHTS_STATEMENTS.map((s) => ({ value: s.uri, label: s.label }));

/** The rights statement (RightsStatements.org), the holder and a note. */
export function RightsFields({ control, register, setValue, errors }: RegistrarFormParts) {
  const rights = useWatch({ control, name: 'rights' });
  const problems = errors.rights;
  const options = { shouldDirty: true };
  return (
    <fieldset className={sectionClass}>
      <legend className={legendClass}>Rights</legend>
      {!rights ? (
        <>
          <p className="text-sm text-ink-faint md:col-span-2">No rights statement yet.</p>
          <Button onClick={() => setValue('rights', { statement: '' }, options)}>
            + Add a rights statement
          </Button>
        </>
      ) : (
        <>
          <SelectField
            label="Rights statement"
            placeholder="Choose a statement"
            hint="From RightsStatements.org"
            options={STATEMENT_OPTIONS}
            {...register('rights.statement')}
            error={problems?.statement?.message}
          />
          <TextField
            label="Rights holder"
            {...register('rights.holder')}
            error={problems?.holder?.message}
          />
          <div className="flex items-end">
            <Button tone="danger" onClick={() => setValue('rights', null, options)}>
              Clear rights
            </Button>
          </div>
          <TextArea
            label="Rights note"
            rows={2}
            className="md:col-span-3"
            {...register('rights.note')}
            error={problems?.note?.message}
          />
        </>
      )}
    </fieldset>
  );
}
