import { useRef, useState, type KeyboardEvent } from 'react';

/**
 * Arrow keys move focus through a list of results (one tab stop for the whole list);
 * Enter opens the focused one, Space picks it. `columns` > 1 makes left/right and up/down work on a grid.
 */
export function useRovingFocus(
  count: number,
  open: (index: number) => void,
  columns = 1,
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
  const onKeyDown = (event: KeyboardEvent) => {
    const steps: Record<string, number> = {
      ArrowDown: columns,
      ArrowUp: -columns,
      ...(columns > 1 ? { ArrowRight: 1, ArrowLeft: -1 } : {}),
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
