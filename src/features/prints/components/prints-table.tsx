import {
  createColumnHelper,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import { Link } from 'react-router-dom';
import type { PrintListItem } from '@shared/types/catalogue';
import { RiskMark, ToneBadge } from '@/components/ui/badges';
import { paths } from '@/config/paths';

const features = tableFeatures({ rowSortingFeature });
const column = createColumnHelper<typeof features, PrintListItem>();

const minutes = (value: number | null) => (value == null ? '—' : `${value}`);

const columns = column.columns([
  column.accessor('accessionNumber', {
    header: 'Accession',
    cell: (info) => (
      <Link to={paths.print(info.row.original.id)} className="font-mono text-xs">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor('title', {
    header: 'Title',
    cell: (info) => (
      <Link to={paths.print(info.row.original.id)} className="font-serif text-base text-ink">
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor('process', { header: 'Process', enableSorting: false }),
  column.accessor((row) => row.paper?.name ?? '—', {
    id: 'paper',
    header: 'Paper',
    enableSorting: false,
  }),
  column.accessor('madeOn', { header: 'Made', cell: (info) => info.getValue() ?? '—' }),
  column.accessor('fixingMinutes', {
    header: 'Fix (min)',
    enableSorting: false,
    cell: (info) => minutes(info.getValue()),
  }),
  column.accessor('washingMinutes', {
    header: 'Wash (min)',
    enableSorting: false,
    cell: (info) => minutes(info.getValue()),
  }),
  column.accessor('toneStatus', {
    header: 'Tone',
    enableSorting: false,
    cell: (info) => <ToneBadge status={info.getValue()} />,
  }),
  column.accessor('processingRisk', {
    header: 'Processing',
    enableSorting: false,
    cell: (info) => <RiskMark risky={info.getValue()} />,
  }),
]);

/** Widths that keep a tablet-width table readable: titles wrap, dates and numbers do not. */
const CELL_CLASS: Record<string, string> = {
  accessionNumber: 'whitespace-nowrap',
  title: 'min-w-[11rem]',
  paper: 'min-w-[9rem]',
  madeOn: 'whitespace-nowrap',
  fixingMinutes: 'text-right tabular-nums',
  washingMinutes: 'text-right tabular-nums',
  toneStatus: 'whitespace-nowrap',
};

const ariaSort = (sorted: false | 'asc' | 'desc') =>
  sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none';

/** The catalogue list; sorting is done by the server, so the table only reports clicks. */
export function PrintsTable({
  items,
  sorting,
  onSortingChange,
}: {
  items: PrintListItem[];
  sorting: SortingState;
  onSortingChange: (next: SortingState) => void;
}) {
  const table = useTable({
    features,
    columns,
    data: items,
    manualSorting: true,
    enableSortingRemoval: false,
    state: { sorting },
    onSortingChange: (updater: Updater<SortingState>) =>
      onSortingChange(typeof updater === 'function' ? updater(sorting) : updater),
  });

  return (
    <div className="relative overflow-x-auto rounded border border-paper-edge bg-white/60">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">Prints in the catalogue</caption>
        <thead className="bg-paper-deep text-left text-xs tracking-wide text-ink-soft uppercase">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={header.column.getCanSort() ? ariaSort(sorted) : undefined}
                    className="px-3 py-2 font-semibold whitespace-nowrap"
                  >
                    {header.column.getCanSort() ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="inline-flex items-center gap-1 uppercase hover:text-gall"
                      >
                        <table.FlexRender header={header} />
                        <span aria-hidden="true">
                          {sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}
                        </span>
                      </button>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-t border-paper-edge/70 hover:bg-paper-deep/50">
              {row.getAllCells().map((cell) => (
                <td
                  key={cell.id}
                  className={`px-3 py-1.5 align-middle ${CELL_CLASS[cell.column.id] ?? ''}`}
                >
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
