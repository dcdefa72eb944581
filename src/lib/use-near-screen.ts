import { useEffect, useRef, useState } from 'react';
import { flushSync } from 'react-dom';

/**
 * Whether an element has come within `margin` of the screen (once true, stays true): heavy
 * parts such as charts load their code only then, not with the page. Where the browser has
 * no IntersectionObserver, it answers true at once. Printing counts as near: a printed page
 * shows everything, so what has not drawn yet draws when the page is about to print
 * (`beforeprint`, from Ctrl+P or window.print()) or is shown as print media.
 */
export function useNearScreen<T extends Element>(margin = '200px') {
  const ref = useRef<T>(null);
  const [near, setNear] = useState(
    () => typeof IntersectionObserver === 'undefined' || printing()?.matches === true,
  );
  useEffect(() => {
    const element = ref.current;
    if (near || !element) return;
    const observer = new IntersectionObserver(
      (entries) => {
        if (entries.some((entry) => entry.isIntersecting)) {
          setNear(true);
          observer.disconnect();
        }
      },
      { rootMargin: margin },
    );
    observer.observe(element);
    // Drawn at once, not at React's leisure: the browser lays out the printed pages next.
    const beforePrint = () => flushSync(() => setNear(true));
    const media = printing();
    const onMedia = (event: MediaQueryListEvent) => {
      if (event.matches) setNear(true);
    };
    window.addEventListener('beforeprint', beforePrint);
    media?.addEventListener('change', onMedia);
    return () => {
      observer.disconnect();
      window.removeEventListener('beforeprint', beforePrint);
      media?.removeEventListener('change', onMedia);
    };
  }, [near, margin]);
  return [ref, near] as const;
}

function printing(): MediaQueryList | null {
  return typeof window.matchMedia === 'function' ? window.matchMedia('print') : null;
}
