import { useCallback, useSyncExternalStore } from 'react';

/**
 * Whether a CSS media query matches now, following it as the window changes. Where the
 * browser has no matchMedia, it answers `fallback`.
 */
export function useMediaQuery(query: string, fallback = true): boolean {
  // Kept across renders, so the store is not unsubscribed and subscribed again each time.
  const subscribe = useCallback(
    (onChange: () => void) => {
      if (typeof window.matchMedia !== 'function') return () => undefined;
      const list = window.matchMedia(query);
      list.addEventListener('change', onChange);
      return () => list.removeEventListener('change', onChange);
    },
    [query],
  );
  return useSyncExternalStore(
    subscribe,
    () => (typeof window.matchMedia === 'function' ? window.matchMedia(query).matches : fallback),
    () => fallback,
  );
}
