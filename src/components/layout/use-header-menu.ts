import { useCallback, useEffect, useId, useRef, useState, type RefObject } from 'react';

/**
 * Closes an open menu when a click or focus lands outside `root`, or on Escape (focus then
 * returns to the menu's button, so keyboard users are not left on a vanished link).
 */
function useDismiss(
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

/**
 * A header menu's state: a button that opens and shuts a panel (spread `buttonProps` on the
 * button, `panelProps` on the panel, `root` on what holds both), dismissed as `useDismiss` says.
 */
export function useHeaderMenu() {
  const [open, setOpen] = useState(false);
  const root = useRef<HTMLDivElement>(null);
  const button = useRef<HTMLButtonElement>(null);
  const panel = useId();
  const close = useCallback(() => setOpen(false), []);
  useDismiss(open, root, button, close);
  return {
    open,
    close,
    root,
    buttonProps: {
      ref: button,
      type: 'button' as const,
      'aria-expanded': open,
      'aria-controls': panel,
      onClick: () => setOpen((was) => !was),
    },
    panelProps: { id: panel, hidden: !open },
  };
}
