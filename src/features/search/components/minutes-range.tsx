import type { MinuteBand } from '@shared/types/catalogue';
import { bandLabel } from '@shared/domain/search-bands';

/** "10 to under 15 min: 3 of the collection's 12 match". */
function bandWords(index: number, edges: number[], matching: number, all: number): string {
  return `${bandLabel(index, edges)}: ${matching} of the collection’s ${all} match`;
}

/**
 * A minutes range (from, to) with a small histogram of the whole collection behind it;
 * the bars inside the chosen range are dark, and each carries the current query's count.
 */
export function MinutesRange({
  label,
  collection,
  current,
  min,
  max,
  onChange,
}: {
  label: string;
  collection: MinuteBand[] | undefined;
  current: MinuteBand[] | undefined;
  min: string;
  max: string;
  onChange: (min: string, max: string) => void;
}) {
  const edges = (collection ?? []).map((band) => band.from);
  const tallest = Math.max(1, ...(collection ?? []).map((band) => band.count));
  const inRange = (band: MinuteBand) =>
    (min === '' || (band.to ?? Infinity) > Number(min)) && (max === '' || band.from <= Number(max));
  const id = label.toLowerCase().replace(/\W+/g, '-');
  const inverted = min !== '' && max !== '' && Number(max) < Number(min);
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-xs font-semibold tracking-wide text-ink-soft uppercase">
        {label}
      </legend>
      <div className="flex h-10 items-end gap-0.5" aria-hidden="true">
        {(collection ?? []).map((band, index) => (
          <div
            key={band.from}
            title={bandWords(index, edges, current?.[index]?.count ?? 0, band.count)}
            className={`flex-1 rounded-t-sm ${inRange(band) ? 'bg-gall' : 'bg-paper-edge'}`}
            style={{ height: `${Math.max(4, (band.count / tallest) * 100)}%` }}
          />
        ))}
      </div>
      <ul className="sr-only">
        {(collection ?? []).map((band, index) => (
          <li key={band.from}>
            {bandWords(index, edges, current?.[index]?.count ?? 0, band.count)}
          </li>
        ))}
      </ul>
      <div className="flex items-center gap-1 text-sm">
        <label htmlFor={`${id}-min`} className="sr-only">
          {label}: at least (minutes)
        </label>
        <input
          id={`${id}-min`}
          type="number"
          min={0}
          inputMode="decimal"
          placeholder="from"
          value={min}
          onChange={(event) => onChange(event.target.value, max)}
          className="w-16 rounded border border-paper-edge bg-white px-1.5 py-1"
        />
        <span aria-hidden="true">–</span>
        <label htmlFor={`${id}-max`} className="sr-only">
          {label}: at most (minutes)
        </label>
        <input
          id={`${id}-max`}
          type="number"
          min={0}
          inputMode="decimal"
          placeholder="to"
          value={max}
          onChange={(event) => onChange(min, event.target.value)}
          aria-invalid={inverted || undefined}
          aria-describedby={inverted ? `${id}-inverted` : undefined}
          className="w-16 rounded border border-paper-edge bg-white px-1.5 py-1 aria-[invalid=true]:border-alert"
        />
        <span className="text-ink-faint">min</span>
      </div>
      {inverted && (
        <p id={`${id}-inverted`} role="alert" className="text-xs font-medium text-alert">
          “To” ({max}) is less than “from” ({min}): no print can match. Swap the two values.
        </p>
      )}
    </fieldset>
  );
}
