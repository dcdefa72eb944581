import {
  createColumnHelper,
  rowSelectionFeature,
  rowSortingFeature,
  tableFeatures,
  useTable,
  type RowSelectionState,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import type { PrintListItem } from '@shared/types/catalogue';
import { RiskMark, ToneBadge } from '@/components/ui/badges';
import { paths } from '@/config/paths';
import { Highlight } from './highlight';
import { useRovingFocus } from './use-roving-focus';

const features = tableFeatures({ rowSortingFeature, rowSelectionFeature });
const column = createColumnHelper<typeof features, PrintListItem>();

const minutes = (value: number | null) => (value == null ? '—' : String(value));
const NO_WORDS: ReadonlySet<string> = new Set();

/** What the cells need beyond their row: the matched words and what opening a print does. */
interface CellContext {
  words: ReadonlySet<string>;
  onOpen?: (id: number) => void;
}

const pickColumn = column.display({
  id: 'pick',
  header: () => <span className="sr-only">Pick</span>,
  cell: ({ row }) => (
    <input
      type="checkbox"
      tabIndex={-1}
      aria-label={`Pick ${row.original.accessionNumber}`}
      checked={row.getIsSelected()}
      onChange={row.getToggleSelectedHandler()}
    />
  ),
});

const dataColumns = (context: CellContext) =>
  column.columns([
    column.accessor('accessionNumber', {
      header: 'Accession',
      cell: (info) => <Highlight text={info.getValue()} words={context.words} />,
    }),
    column.accessor('title', {
      header: 'Title · maker',
      cell: ({ row }) => (
        <>
          <Link
            to={paths.print(row.original.id)}
            tabIndex={-1}
            data-print-link={row.original.id}
            onClick={() => context.onOpen?.(row.original.id)}
            className="font-serif text-base text-ink"
          >
            <Highlight text={row.original.title} words={context.words} />
          </Link>
          <div className="text-xs text-ink-soft">
            <Highlight text={row.original.maker} words={context.words} />
          </div>
        </>
      ),
    }),
    column.accessor('process', {
      header: 'Process · paper',
      enableSorting: false,
      cell: ({ row }) => (
        <>
          <Highlight text={row.original.process} words={context.words} />
          <div className="text-xs text-ink-soft">
            <Highlight text={row.original.paper?.name ?? null} words={context.words} />
          </div>
        </>
      ),
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
      header: 'Tone · processing',
      enableSorting: false,
      cell: ({ row }) => (
        <>
          <ToneBadge status={row.original.toneStatus} />{' '}
          <RiskMark risky={row.original.processingRisk} />
        </>
      ),
    }),
  ]);

/**
 * Widths: on wide screens titles get room; at tablet width (and beside Search's filters)
 * every column may wrap, so the tone column stays on screen without scrolling sideways. A
 * title keeps 10rem from tablet width up: at 768 px it was squeezed to one word a line.
 */
const CELL_CLASS: Record<string, string> = {
  accessionNumber: 'font-mono text-xs whitespace-nowrap',
  title: 'sm:min-w-[10rem] xl:min-w-[12rem]',
  process: 'xl:min-w-[9rem]',
  madeOn: 'whitespace-nowrap',
  fixingMinutes: 'text-right tabular-nums',
  washingMinutes: 'text-right tabular-nums',
  toneStatus: 'min-w-[7.5rem]',
};

/** The column's name for stacked phone rows (the header's text holds the sort arrows too). */
const columnLabel = (id: string, header: unknown) =>
  id === 'pick' ? 'Pick' : typeof header === 'string' ? header : '';

const ariaSort = (sorted: false | 'asc' | 'desc') =>
  sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : 'none';

export interface PrintListTableProps {
  items: PrintListItem[];
  caption: string;
  /** The server sorts: the headers only report which column was asked for. */
  sorting: SortingState;
  onSortingChange: (next: SortingState) => void;
  /** Words the search matched, marked in the cells. */
  words?: ReadonlySet<string>;
  /** With these, each row has a Pick box and Space picks the focused row. */
  picked?: ReadonlySet<number>;
  onPick?: (id: number, picked: boolean) => void;
  /** Called as a print is opened from the list (by click or Enter). */
  onOpen?: (id: number) => void;
}

/**
 * The one list of prints, shown by the Prints list and by Search: sortable headers, optional
 * picking, matched words marked. Arrow keys move between rows, Enter opens, Space picks.
 */
export function PrintListTable({
  items,
  caption,
  sorting,
  onSortingChange,
  words = NO_WORDS,
  picked,
  onPick,
  onOpen,
}: PrintListTableProps) {
  const navigate = useNavigate();
  const picking = Boolean(picked && onPick);
  const rowSelection: RowSelectionState = Object.fromEntries(
    [...(picked ?? [])].map((id) => [String(id), true]),
  );
  const columns = useMemo(() => {
    const data = dataColumns({ words, onOpen });
    return picking ? column.columns([pickColumn, ...data]) : data;
  }, [words, onOpen, picking]);
  const table = useTable({
    features,
    columns,
    data: items,
    getRowId: (row) => String(row.id),
    manualSorting: true,
    enableSortingRemoval: false,
    enableRowSelection: picking,
    state: { sorting, rowSelection },
    onSortingChange: (updater: Updater<SortingState>) =>
      onSortingChange(typeof updater === 'function' ? updater(sorting) : updater),
    onRowSelectionChange: (updater: Updater<RowSelectionState>) => {
      const next = typeof updater === 'function' ? updater(rowSelection) : updater;
      for (const item of items) {
        const now = Boolean(next[String(item.id)]);
        if (now !== Boolean(rowSelection[String(item.id)])) onPick?.(item.id, now);
      }
    },
  });
  const rows = table.getRowModel().rows;
  const roving = useRovingFocus(
    rows.length,
    (index) => {
      const id = items[index]!.id;
      onOpen?.(id);
      navigate(paths.print(id));
    },
    1,
    picking ? (index) => rows[index]!.toggleSelected() : undefined,
  );

  return (
    <div className="relative overflow-x-auto rounded border border-paper-edge bg-white/60">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">
          {caption}. Arrow keys move between rows; Enter opens a print
          {picking ? '; Space picks it' : ''}.
        </caption>
        <thead className="bg-paper-deep text-left text-xs tracking-wide text-ink-soft uppercase">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const canSort = header.column.getCanSort();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={canSort ? ariaSort(sorted) : undefined}
                    data-column-label={columnLabel(
                      header.column.id,
                      header.column.columnDef.header,
                    )}
                    className="px-2 py-2 align-bottom font-semibold xl:whitespace-nowrap"
                  >
                    {canSort ? (
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
        <tbody onKeyDown={roving.onKeyDown}>
          {rows.map((row, index) => (
            <tr
              key={row.id}
              {...roving.itemProps(index)}
              aria-label={`${row.original.accessionNumber} ${row.original.title}`}
              className="border-t border-paper-edge/70 hover:bg-paper-deep/50 focus:bg-gall-light focus:outline-2 focus:outline-gall"
            >
              {row.getAllCells().map((cell) => (
                <td
                  key={cell.id}
                  className={`px-2 py-1.5 align-middle ${CELL_CLASS[cell.column.id] ?? ''}`}
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
