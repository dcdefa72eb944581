import {
  IMPORT_FIELD_LABELS,
  IMPORT_FIELDS,
  REQUIRED_IMPORT_FIELDS,
} from '@shared/domain/import-fields';
import type { ImportInspection } from '@shared/types/imports';

/** One line per column of the file: its first values and the field it goes to. */
export function MappingTable({
  inspection,
  mapping,
  onChange,
}: {
  inspection: ImportInspection;
  mapping: Record<string, string>;
  onChange: (mapping: Record<string, string>) => void;
}) {
  const used = new Set(Object.values(mapping));
  const missing = REQUIRED_IMPORT_FIELDS.filter((field) => !used.has(field));
  const choose = (column: string, field: string) => {
    const next = { ...mapping };
    if (field) next[column] = field;
    else delete next[column];
    onChange(next);
  };
  return (
    <div>
      <div className="relative overflow-x-auto">
        <table className="w-full border-collapse text-sm">
          <caption className="mb-2 text-left text-ink-soft">
            Columns of the file and the field each fills
            {inspection.savedMapping ? ' (as you mapped this layout last time)' : ''}.
          </caption>
          <thead>
            <tr className="border-b border-paper-edge text-left">
              <th scope="col" className="py-1 pr-3">
                Column
              </th>
              <th scope="col" className="py-1 pr-3">
                First values
              </th>
              <th scope="col" className="py-1">
                Field
              </th>
            </tr>
          </thead>
          <tbody>
            {inspection.headers.map((column) => (
              <tr key={column} className="border-b border-paper-edge/60">
                <th scope="row" className="py-1 pr-3 text-left font-medium">
                  {column}
                </th>
                <td className="max-w-xs truncate py-1 pr-3 text-ink-faint">
                  {inspection.sample
                    .map((row) => row[column])
                    .filter(Boolean)
                    .slice(0, 3)
                    .join(' · ')}
                </td>
                <td className="py-1">
                  <select
                    aria-label={`Field for column ${column}`}
                    value={mapping[column] ?? ''}
                    onChange={(event) => choose(column, event.target.value)}
                    className="w-full rounded border border-paper-edge bg-white px-2 py-1 text-sm"
                  >
                    <option value="">— not imported —</option>
                    {IMPORT_FIELDS.map((field) => (
                      <option
                        key={field}
                        value={field}
                        disabled={used.has(field) && mapping[column] !== field}
                      >
                        {IMPORT_FIELD_LABELS[field]}
                        {REQUIRED_IMPORT_FIELDS.includes(field) ? ' (required)' : ''}
                      </option>
                    ))}
                  </select>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {missing.length > 0 && (
        <p role="status" className="mt-2 text-sm text-alert">
          Still to map: {missing.map((field) => IMPORT_FIELD_LABELS[field]).join(', ')}.
        </p>
      )}
    </div>
  );
}
