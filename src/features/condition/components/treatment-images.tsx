import type { Control } from 'react-hook-form';
import type { TreatmentCreate, TreatmentCreateInput } from '@shared/schemas/condition';
import type { PrintView } from '@shared/types/catalogue';

/** Before and after photographs from the print's images; none until the print has some. */
export function TreatmentImages({
  print,
}: {
  print: PrintView;
  control: Control<TreatmentCreateInput, unknown, TreatmentCreate>;
}) {
  if (print.assets.length === 0) {
    return (
      <p className="text-sm text-ink-faint">
        Add before and after photographs to the record to link them to this treatment.
      </p>
    );
  }
  return null;
}
