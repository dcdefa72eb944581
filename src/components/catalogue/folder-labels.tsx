import { LABEL_SHEETS } from '@shared/domain/label-sheets';
import { useState } from 'react';
import { SelectField } from '@/components/ui/field';

/**
 * A sheet of folder labels for some prints (accession number, title, a QR code that opens
 * the print), on the label stock chosen for this run.
 */
export function FolderLabels({ printIds }: { printIds: readonly number[] }) {
  const [layout, setLayout] = useState<string>(LABEL_SHEETS[0].id);
  const href = `/api/prints/labels.pdf?ids=${printIds.join(',')}&layout=${layout}`;
  return (
    <div className="flex flex-col gap-2">
      <SelectField
        label="Label sheet"
        value={layout}
        onChange={(event) => setLayout(event.target.value)}
        options={LABEL_SHEETS.map((sheet) => ({ value: sheet.id, label: sheet.label }))}
        hint="Check the sizes against the box of labels before printing."
      />
      <a href={href} className="text-sm">
        Folder labels for {printIds.length} {printIds.length === 1 ? 'print' : 'prints'} (PDF)
      </a>
    </div>
  );
}
