import { Link, useNavigate } from 'react-router-dom';
import { rememberOpened } from './return-to-results';
import type { PrintListItem } from '@shared/types/catalogue';
import { RiskMark, ToneBadge } from '@/components/ui/badges';
import { paths } from '@/config/paths';
import { Highlight } from './highlight';
import { useRovingFocus } from './use-roving-focus';

interface ResultsProps {
  items: Array<PrintListItem & { thumbnailUrl?: string | null }>;
  words: ReadonlySet<string>;
  picked: ReadonlySet<number>;
  onPick: (id: number, picked: boolean) => void;
}

const minutes = (value: number | null) => (value == null ? '—' : String(value));

/** Results as a dense table: arrows move between rows, Enter opens the record. */
export function ResultsTable({ items, words, picked, onPick }: ResultsProps) {
  const navigate = useNavigate();
  const roving = useRovingFocus(
    items.length,
    (index) => {
      rememberOpened(items[index]!.id);
      navigate(paths.print(items[index]!.id));
    },
    1,
    (index) => onPick(items[index]!.id, !picked.has(items[index]!.id)),
  );
  return (
    <div className="relative overflow-x-auto rounded border border-paper-edge bg-white/60">
      <table className="w-full border-collapse text-sm">
        <caption className="sr-only">
          Search results. Arrow keys move between rows; Enter opens a print; Space picks it.
        </caption>
        <thead className="bg-paper-deep text-left text-xs tracking-wide text-ink-soft uppercase">
          <tr>
            <th scope="col" className="px-2 py-2">
              <span className="sr-only">Pick</span>
            </th>
            <th scope="col" className="px-2 py-2">
              Accession
            </th>
            <th scope="col" className="px-2 py-2">
              Title · maker
            </th>
            <th scope="col" className="px-2 py-2">
              Process · paper
            </th>
            <th scope="col" className="px-2 py-2">
              Made
            </th>
            <th scope="col" className="px-2 py-2 text-right">
              Fix
            </th>
            <th scope="col" className="px-2 py-2 text-right">
              Wash
            </th>
            <th scope="col" className="px-2 py-2">
              Tone
            </th>
          </tr>
        </thead>
        <tbody onKeyDown={roving.onKeyDown}>
          {items.map((item, index) => (
            <tr
              key={item.id}
              {...roving.itemProps(index)}
              aria-label={`${item.accessionNumber} ${item.title}`}
              className="border-t border-paper-edge/70 hover:bg-paper-deep/50 focus:bg-gall-light focus:outline-2 focus:outline-gall"
            >
              <td className="px-2 py-1.5">
                <input
                  type="checkbox"
                  tabIndex={-1}
                  aria-label={`Pick ${item.accessionNumber}`}
                  checked={picked.has(item.id)}
                  onChange={(event) => onPick(item.id, event.target.checked)}
                />
              </td>
              <td className="px-2 py-1.5 font-mono text-xs whitespace-nowrap">
                <Highlight text={item.accessionNumber} words={words} />
              </td>
              <td className="min-w-[12rem] px-2 py-1.5">
                <Link
                  to={paths.print(item.id)}
                  tabIndex={-1}
                  data-print-link={item.id}
                  onClick={() => rememberOpened(item.id)}
                  className="font-serif text-base text-ink"
                >
                  <Highlight text={item.title} words={words} />
                </Link>
                <div className="text-xs text-ink-soft">
                  <Highlight text={item.maker} words={words} />
                </div>
              </td>
              <td className="min-w-[9rem] px-2 py-1.5">
                <Highlight text={item.process} words={words} />
                <div className="text-xs text-ink-soft">
                  <Highlight text={item.paper?.name ?? null} words={words} />
                </div>
              </td>
              <td className="px-2 py-1.5 whitespace-nowrap">{item.madeOn ?? '—'}</td>
              <td className="px-2 py-1.5 text-right tabular-nums">{minutes(item.fixingMinutes)}</td>
              <td className="px-2 py-1.5 text-right tabular-nums">
                {minutes(item.washingMinutes)}
              </td>
              <td className="px-2 py-1.5 whitespace-nowrap">
                <ToneBadge status={item.toneStatus} /> <RiskMark risky={item.processingRisk} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** Results as a grid of thumbnails (a quiet placeholder until a print has images). */
export function ResultsGrid({ items, words, picked, onPick }: ResultsProps) {
  const navigate = useNavigate();
  const roving = useRovingFocus(
    items.length,
    (index) => {
      rememberOpened(items[index]!.id);
      navigate(paths.print(items[index]!.id));
    },
    'auto',
    (index) => onPick(items[index]!.id, !picked.has(items[index]!.id)),
  );
  return (
    <ul
      aria-label="Search results. Arrow keys move between prints; Enter opens one."
      onKeyDown={roving.onKeyDown}
      className="grid grid-cols-2 gap-3 md:grid-cols-3 lg:grid-cols-4"
    >
      {items.map((item, index) => (
        <li
          key={item.id}
          {...roving.itemProps(index)}
          aria-label={`${item.accessionNumber} ${item.title}`}
          className="flex flex-col gap-1 rounded border border-paper-edge bg-white/60 p-2 focus:bg-gall-light focus:outline-2 focus:outline-gall"
        >
          {item.thumbnailUrl ? (
            <img src={item.thumbnailUrl} alt="" className="aspect-[4/5] w-full object-contain" />
          ) : (
            <div
              aria-hidden="true"
              className="flex aspect-[4/5] w-full items-center justify-center rounded-sm bg-paper-deep font-mono text-xs text-ink-faint"
            >
              no image yet
            </div>
          )}
          <Link
            to={paths.print(item.id)}
            tabIndex={-1}
            data-print-link={item.id}
            onClick={() => rememberOpened(item.id)}
            className="font-serif text-base leading-tight text-ink"
          >
            <Highlight text={item.title} words={words} />
          </Link>
          <span className="text-xs text-ink-soft">
            {item.accessionNumber} · <Highlight text={item.maker} words={words} />
          </span>
          <label className="flex items-center gap-1 text-xs">
            <input
              type="checkbox"
              tabIndex={-1}
              checked={picked.has(item.id)}
              onChange={(event) => onPick(item.id, event.target.checked)}
            />
            Pick
          </label>
        </li>
      ))}
    </ul>
  );
}
