import { Link, useNavigate } from 'react-router-dom';
import { rememberOpened } from './return-to-results';
import type { PrintListItem } from '@shared/types/catalogue';
import { paths } from '@/config/paths';
import { Highlight } from '@/components/catalogue/highlight';
import { useRovingFocus } from '@/components/catalogue/use-roving-focus';

interface ResultsProps {
  items: Array<PrintListItem & { thumbnailUrl?: string | null }>;
  words: ReadonlySet<string>;
  picked: ReadonlySet<number>;
  onPick: (id: number, picked: boolean) => void;
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
