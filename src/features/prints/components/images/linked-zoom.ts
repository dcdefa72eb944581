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
    // Relative to each image's home view, so sides of different size and shape line up.
    const follow = (from: OpenSeadragon.Viewer, to: OpenSeadragon.Viewer) => () => {
      if (following.current || !from.world.getItemCount() || !to.world.getItemCount()) return;
      following.current = true;
      const source = from.viewport;
      const target = to.viewport;
      const fromHome = source.getHomeBounds();
      const toHome = target.getHomeBounds();
      const scale = toHome.width / fromHome.width;
      const centre = source.getCenter(false);
      const fromMiddle = fromHome.getCenter();
      const toMiddle = toHome.getCenter();
      target.zoomTo(
        (source.getZoom(false) / source.getHomeZoom()) * target.getHomeZoom(),
        undefined,
        true,
      );
      target.panTo(toMiddle.plus(centre.minus(fromMiddle).times(scale)), true);
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
