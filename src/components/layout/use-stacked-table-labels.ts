import { useCallback, useRef } from 'react';

/** Gives each body cell the text of its column's header, for the stacked rows of narrow screens. */
export function labelTableCells(root: ParentNode): void {
  for (const table of root.querySelectorAll('table')) {
    const headRow = table.tHead?.rows[0];
    if (!headRow) continue;
    const names: string[] = [];
    for (const cell of headRow.cells) {
      const name = (cell.textContent ?? '').replace(/\s+/g, ' ').trim();
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
 * A ref for the page's main element: keeps every table's cells labelled with their column
 * names (see `labelTableCells`) as pages render and change, so the stylesheet can stack
 * rows under 640 px without each of the app's tables repeating its headers.
 */
export function useStackedTableLabels(): (element: HTMLElement | null) => void {
  const observer = useRef<MutationObserver | null>(null);
  return useCallback((element: HTMLElement | null) => {
    observer.current?.disconnect();
    observer.current = null;
    if (!element) return;
    let queued = false;
    const relabel = () => {
      queued = false;
      labelTableCells(element);
    };
    observer.current = new MutationObserver(() => {
      if (queued) return;
      queued = true;
      requestAnimationFrame(relabel);
    });
    observer.current.observe(element, { childList: true, subtree: true, characterData: true });
    relabel();
  }, []);
}
