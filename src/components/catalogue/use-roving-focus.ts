import { useRef, useState, type KeyboardEvent } from 'react';

/**
 * Arrow keys move focus through a list of results (one tab stop for the whole list);
 * Enter opens the focused one, Space picks it. `columns: 'auto'` makes left/right and
 * up/down work on a grid of any width.
 */
export function useRovingFocus(
  count: number,
  open: (index: number) => void,
  columns: number | 'auto' = 1,
  toggle?: (index: number) => void,
) {
  const [active, setActive] = useState(0);
  const refs = useRef<Array<HTMLElement | null>>([]);
  const current = Math.min(active, Math.max(0, count - 1));
  const move = (to: number) => {
    const next = Math.max(0, Math.min(count - 1, to));
    setActive(next);
    refs.current[next]?.focus();
  };
  /** A grid's columns are however many items share the first row's top edge. */
  const perRow = () => {
    if (columns !== 'auto') return columns;
    const top = refs.current[0]?.offsetTop;
    return Math.max(1, refs.current.filter((element) => element?.offsetTop === top).length);
  };
  const onKeyDown = (event: KeyboardEvent) => {
    const across = perRow();
    const steps: Record<string, number> = {
      ArrowDown: across,
      ArrowUp: -across,
      ...(columns !== 1 ? { ArrowRight: 1, ArrowLeft: -1 } : {}),
    };
    if (event.key in steps) {
      event.preventDefault();
      move(current + steps[event.key]!);
    } else if (event.key === 'Home') {
      event.preventDefault();
      move(0);
    } else if (event.key === 'End') {
      event.preventDefault();
      move(count - 1);
    } else if (event.key === ' ' && toggle && event.target === refs.current[current]) {
      event.preventDefault();
      toggle(current);
    } else if (event.key === 'Enter' && event.target === refs.current[current]) {
      event.preventDefault();
      open(current);
    }
  };
  return {
    itemProps: (index: number) => ({
      ref: (element: HTMLElement | null) => {
        refs.current[index] = element;
      },
      tabIndex: index === current ? 0 : -1,
      onFocus: () => setActive(index),
    }),
    onKeyDown,
  };
}
