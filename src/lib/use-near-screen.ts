import { useEffect, useRef, useState } from 'react';

/**
 * Whether an element has come within `margin` of the screen (once true, stays true): heavy
 * parts such as charts load their code only then, not with the page. Where the browser has
 * no IntersectionObserver, it answers true at once.
 */
export function useNearScreen<T extends Element>(margin = '200px') {
  const ref = useRef<T>(null);
  const [near, setNear] = useState(() => typeof IntersectionObserver === 'undefined');
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
    return () => observer.disconnect();
  }, [near, margin]);
  return [ref, near] as const;
}
