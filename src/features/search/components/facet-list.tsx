import clsx from 'clsx';

/** Values of one filter with how many current matches each has; the chosen one is pressed. */
export function FacetList<V extends string | number>({
  label,
  values,
  counts,
  selected,
  onSelect,
}: {
  label: string;
  values: Array<{ value: V; label: string }>;
  counts: Array<{ value: V; count: number }> | undefined;
  selected: string;
  onSelect: (value: string) => void;
}) {
  const countOf = (value: V) => counts?.find((facet) => facet.value === value)?.count ?? 0;
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-xs font-semibold tracking-wide text-ink-soft uppercase">
        {label}
      </legend>
      <ul className="flex flex-col gap-0.5 text-sm">
        {values.map(({ value, label: name }) => {
          const pressed = selected === String(value);
          const count = countOf(value);
          return (
            <li key={value}>
              <button
                type="button"
                aria-pressed={pressed}
                onClick={() => onSelect(pressed ? '' : String(value))}
                className={clsx(
                  'flex w-full items-baseline justify-between gap-2 rounded px-1.5 py-0.5 text-left',
                  pressed ? 'bg-gall text-paper' : 'hover:bg-paper-deep',
                  !pressed && count === 0 && 'text-ink-faint',
                )}
              >
                <span>{name}</span>
                <span className="tabular-nums">{count}</span>
              </button>
            </li>
          );
        })}
      </ul>
    </fieldset>
  );
}
