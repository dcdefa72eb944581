import type { Control } from 'react-hook-form';
import type { ConditionReportCreate, ConditionReportCreateInput } from '@shared/schemas/condition';
import type { PrintView } from '@shared/types/catalogue';

/**
 * Photographs of the print to attach, with the area marked on each. The print's images
 * come from the images area; until a print has any, there is nothing to attach.
 */
export function ImageAttachments({
  print,
}: {
  print: PrintView;
  control: Control<ConditionReportCreateInput, unknown, ConditionReportCreate>;
}) {
  if (print.assets.length === 0) {
    return (
      <p className="text-sm text-ink-faint">
        This print has no photographs yet; add them to the record to attach them here.
      </p>
    );
  }
  return null;
}
