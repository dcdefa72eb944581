import { useCallback, useEffect, useRef } from 'react';
import { useLocation, useNavigation } from 'react-router-dom';

/**
 * Whether the person has asked to leave this page: a link to another page clicked (or opened
 * with Enter), or the router on its way to another page while that page's code loads.
 * Work that would change the address a moment later (a search box's pause after typing)
 * asks this first, so a click on a result is never overridden by a search sent after it.
 * Changes of the query alone are not leaving.
 */
export function useLeavingPage(): () => boolean {
  const { pathname } = useLocation();
  const navigation = useNavigation();
  const navigating =
    navigation.state !== 'idle' &&
    navigation.location !== undefined &&
    navigation.location.pathname !== pathname;
  const clicked = useRef(false);
  const underway = useRef(navigating);
  useEffect(() => {
    underway.current = navigating;
  }, [navigating]);
  useEffect(() => {
    clicked.current = false;
    // Capturing: the click is seen before the router's own handler starts the navigation.
    const onClick = (event: MouseEvent) => {
      if (event.button !== 0 || event.metaKey || event.ctrlKey || event.shiftKey) return;
      const link = event.target instanceof Element ? event.target.closest('a[href]') : null;
      if (!(link instanceof HTMLAnchorElement) || (link.target && link.target !== '_self')) return;
      const url = new URL(link.href, window.location.href);
      if (url.origin === window.location.origin && url.pathname !== pathname) {
        clicked.current = true;
      }
    };
    document.addEventListener('click', onClick, true);
    return () => document.removeEventListener('click', onClick, true);
  }, [pathname]);
  return useCallback(() => clicked.current || underway.current, []);
}
