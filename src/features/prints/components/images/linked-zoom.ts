import type OpenSeadragon from 'openseadragon';
import { useEffect, useRef, useState } from 'react';

/**
 * Keeps two viewers at the same zoom and centre (recto and verso side by side). A flag
 * stops the echo: moving one moves the other, whose move is then ignored.
 */
export function useLinkedZoom(linked: boolean) {
  const [viewers, setViewers] = useState<
    [OpenSeadragon.Viewer | null, OpenSeadragon.Viewer | null]
  >([null, null]);
  const following = useRef(false);

  useEffect(() => {
    const [a, b] = viewers;
    if (!linked || !a || !b) return;
    const follow = (from: OpenSeadragon.Viewer, to: OpenSeadragon.Viewer) => () => {
      if (following.current) return;
      following.current = true;
      to.viewport.zoomTo(from.viewport.getZoom(false), undefined, true);
      to.viewport.panTo(from.viewport.getCenter(false), true);
      following.current = false;
    };
    const aToB = follow(a, b);
    const bToA = follow(b, a);
    a.addHandler('viewport-change', aToB);
    b.addHandler('viewport-change', bToA);
    return () => {
      a.removeHandler('viewport-change', aToB);
      b.removeHandler('viewport-change', bToA);
    };
  }, [viewers, linked]);

  return {
    first: (viewer: OpenSeadragon.Viewer | null) => setViewers((v) => [viewer, v[1]]),
    second: (viewer: OpenSeadragon.Viewer | null) => setViewers((v) => [v[0], viewer]),
  };
}
