import { useCallback, useRef } from 'react';

/** Where tables stack (the width in src/styles/responsive.css); wider, the labels are unused. */
const STACKED_TABLES_QUERY = '(max-width: 639.98px)';

/** Gives each body cell the text of its column's header, for the stacked rows of narrow screens. */
export function labelTableCells(root: ParentNode): void {
  for (const table of root.querySelectorAll('table')) {
    const headRow = table.tHead?.rows[0];
    if (!headRow) continue;
    const names: string[] = [];
    for (const cell of headRow.cells) {
      // A header may name itself (data-column-label) when its text holds more, e.g. sort arrows.
      const name = (cell.dataset.columnLabel ?? cell.textContent ?? '').replace(/\s+/g, ' ').trim();
      for (let span = 0; span < cell.colSpan; span += 1) names.push(name);
    }
    for (const body of table.tBodies) {
      for (const row of body.rows) {
        let column = 0;
        for (const cell of row.cells) {
          const name = names[column] ?? '';
          if (cell.getAttribute('data-label') !== name) cell.setAttribute('data-label', name);
          column += cell.colSpan;
        }
      }
    }
  }
}

/**
 * A ref for the page's main element: while the screen is narrow enough for tables to stack,
 * keeps every table's cells labelled with their column names (see `labelTableCells`) as
 * pages render and change, so the stylesheet can stack rows without each of the app's tables
 * repeating its headers. On wider screens nothing is watched: every render of every page
 * would otherwise pay for a walk over every table cell.
 */
export function useStackedTableLabels(): (element: HTMLElement | null) => void {
  const stop = useRef<(() => void) | null>(null);
  return useCallback((element: HTMLElement | null) => {
    stop.current?.();
    stop.current = null;
    if (!element) return;
    let queued = false;
    const relabel = () => {
      queued = false;
      labelTableCells(element);
    };
    const observer = new MutationObserver(() => {
      if (queued) return;
      queued = true;
      requestAnimationFrame(relabel);
    });
    const narrow = window.matchMedia(STACKED_TABLES_QUERY);
    const follow = () => {
      observer.disconnect();
      if (!narrow.matches) return;
      observer.observe(element, { childList: true, subtree: true, characterData: true });
      relabel();
    };
    narrow.addEventListener('change', follow);
    follow();
    stop.current = () => {
      narrow.removeEventListener('change', follow);
      observer.disconnect();
    };
  }, []);
}
