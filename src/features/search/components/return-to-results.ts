import { useEffect, useState } from 'react';

const OPENED = 'printwarden:search:opened';
const PICKS = 'printwarden:search:picks';

/** Notes the result being opened, so Back can put focus on its link again. */
export function rememberOpened(printId: number): void {
  sessionStorage.setItem(OPENED, String(printId));
}

/**
 * After Back from a print: once the results are on screen, focus the link of the print that
 * was opened (not the page body), once.
 */
export function useFocusOpened(ready: boolean): void {
  useEffect(() => {
    if (!ready) return;
    const id = sessionStorage.getItem(OPENED);
    if (!id) return;
    const link = document.querySelector<HTMLElement>(`a[data-print-link="${CSS.escape(id)}"]`);
    if (!link) return;
    sessionStorage.removeItem(OPENED);
    link.focus();
  }, [ready]);
}

/** The prints picked in this tab: kept in sessionStorage, so opening a result loses none. */
export function usePicks(): [number[], (update: (list: number[]) => number[]) => void] {
  const [picked, setPicked] = useState<number[]>(() => {
    try {
      const stored: unknown = JSON.parse(sessionStorage.getItem(PICKS) ?? '[]');
      return Array.isArray(stored) ? stored.filter((id) => Number.isInteger(id)) : [];
    } catch {
      return [];
    }
  });
  const update = (change: (list: number[]) => number[]) =>
    setPicked((list) => {
      const next = change(list);
      sessionStorage.setItem(PICKS, JSON.stringify(next));
      return next;
    });
  return [picked, update];
}
