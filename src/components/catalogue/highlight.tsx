import { normalizeWord } from '@shared/domain/search-words';

const WORD = /([\p{L}\p{N}]+(?:[.\-/]\p{N}[\p{L}\p{N}]*)*)/u;

/**
 * The text with every word the index matched marked. Words are compared in the index's
 * own form (lower case, one spelling), so "thiosulphate" lights up for "thiosulfate".
 */
export function Highlight({ text, words }: { text: string | null; words: ReadonlySet<string> }) {
  if (!text) return <>—</>;
  if (!words.size) return <>{text}</>;
  return (
    <>
      {text.split(WORD).map((part, index) =>
        index % 2 === 1 && words.has(normalizeWord(part)) ? (
          <mark key={index} className="rounded-sm bg-gall-light px-0.5 text-ink">
            {part}
          </mark>
        ) : (
          part
        ),
      )}
    </>
  );
}
