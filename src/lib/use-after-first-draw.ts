import { startTransition, useEffect, useState } from 'react';

/**
 * True one background render after `ready` first is: a part of a page that waits on it (a
 * record's panels under the record, Search's filters beside the results) draws in a render
 * and commit of its own once the main part has been painted, instead of in one commit with
 * it. That one commit was the longest task of the page's first load on a slow phone. Use it
 * only for parts that sit below or beside the main part, so nothing already drawn moves.
 */
export function useAfterFirstDraw(ready: boolean): boolean {
  const [shown, setShown] = useState(false);
  useEffect(() => {
    if (ready && !shown) startTransition(() => setShown(true));
  }, [ready, shown]);
  return shown;
}
