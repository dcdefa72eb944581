import { useEffect, type RefObject } from 'react';

/**
 * Closes an open menu when a click or focus lands outside `root`, or on Escape (focus then
 * returns to the menu's button, so keyboard users are not left on a vanished link).
 */
export function useDismiss(
  open: boolean,
  root: RefObject<HTMLElement | null>,
  button: RefObject<HTMLButtonElement | null>,
  close: () => void,
): void {
  useEffect(() => {
    if (!open) return;
    const outside = (event: Event) => {
      if (root.current && !root.current.contains(event.target as Node)) close();
    };
    const escape = (event: KeyboardEvent) => {
      if (event.key !== 'Escape') return;
      close();
      button.current?.focus();
    };
    document.addEventListener('pointerdown', outside);
    document.addEventListener('focusin', outside);
    document.addEventListener('keydown', escape);
    return () => {
      document.removeEventListener('pointerdown', outside);
      document.removeEventListener('focusin', outside);
      document.removeEventListener('keydown', escape);
    };
  }, [open, root, button, close]);
}
