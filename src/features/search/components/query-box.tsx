import { useEffect, useRef, useState } from 'react';
import { useLeavingPage } from '@/lib/use-leaving-page';

const DEBOUNCE_MS = 250;

/**
 * The words box: searches as you type, a moment after the last key. When the address
 * changes from outside (Back, a saved search), the box follows it. A result opened within
 * that moment wins: the search waiting to be sent is dropped, not sent after the click.
 */
export function QueryBox({ value, onSearch }: { value: string; onSearch: (q: string) => void }) {
  const [words, setWords] = useState(value);
  const sent = useRef(value);
  const leaving = useLeavingPage();
  // The latest callback, so a re-render of the page never restarts the pause.
  const search = useRef(onSearch);
  useEffect(() => {
    search.current = onSearch;
  });
  useEffect(() => {
    if (value !== sent.current) {
      sent.current = value;
      setWords(value);
    }
  }, [value]);
  useEffect(() => {
    const trimmed = words.trim();
    if (trimmed === sent.current) return;
    const timer = setTimeout(() => {
      if (leaving()) return;
      sent.current = trimmed;
      search.current(trimmed);
    }, DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [words, leaving]);
  return (
    <div className="flex flex-col gap-1">
      <label
        htmlFor="search-words"
        className="text-xs font-semibold tracking-wide text-ink-soft uppercase"
      >
        Words
      </label>
      <input
        id="search-words"
        type="search"
        autoComplete="off"
        value={words}
        placeholder="cotton rag, swabbed, thiosulfate 15%, 2024.0012…"
        onChange={(event) => setWords(event.target.value)}
        className="w-full rounded border border-paper-edge bg-white px-3 py-2 text-base text-ink"
      />
      <p className="text-xs text-ink-faint">
        Accession number (its first three characters are enough), title, maker, tags, paper,
        negative, description and every processing step; spellings like colour/color and
        thiosulphate/thiosulfate count alike; small typos are forgiven.
      </p>
    </div>
  );
}
