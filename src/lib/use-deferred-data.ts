import { useDeferredValue } from 'react';

/**
 * A query's answer for a page to draw, one step behind it: the page first draws without it
 * (its heading, filters and a loading line) and then again with it in a background render
 * that React splits into slices of a few milliseconds. On a slow phone drawing a list of
 * prints at once held the page for a quarter of a second, the largest part of its blocking
 * time; in slices the browser paints and answers taps between them.
 *
 * Undefined on the page's first draw even when the answer is already cached (the route
 * loader asked for it), and while a changed answer waits for its background render.
 */
export function useDeferredData<T>(data: T | undefined): T | undefined {
  return useDeferredValue(data ?? null, null) ?? undefined;
}
