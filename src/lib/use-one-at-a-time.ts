import { useCallback, useRef } from 'react';

/**
 * Wraps a save so that a second call while the first is still running does nothing. A
 * double click or a second Enter arrives before the disabled button has drawn (the form's
 * checks run first), and each would otherwise send its own request: two prints, two checks.
 */
export function useOneAtATime() {
  const running = useRef(false);
  return useCallback(
    <A extends unknown[]>(action: (...args: A) => Promise<unknown>) =>
      async (...args: A): Promise<void> => {
        if (running.current) return;
        running.current = true;
        try {
          await action(...args);
        } finally {
          running.current = false;
        }
      },
    [],
  );
}
