import type OpenSeadragon from 'openseadragon';
import { useEffect, useState, type RefObject } from 'react';

const controlClass =
  'min-w-9 rounded border border-paper/40 px-2 py-1 text-sm text-paper hover:bg-paper/15 focus-visible:outline-paper';

/** Whether `frame` is the element shown full screen now (Esc leaves without our button). */
function useIsFullScreen(frame: RefObject<HTMLElement | null>): boolean {
  const [isFullScreen, setIsFullScreen] = useState(false);
  useEffect(() => {
    const update = () => setIsFullScreen(document.fullscreenElement === frame.current);
    document.addEventListener('fullscreenchange', update);
    return () => document.removeEventListener('fullscreenchange', update);
  }, [frame]);
  return isFullScreen;
}

/** Our own zoom buttons (no bundled control images): in, out, reset, full screen. */
export function ZoomControls({
  label,
  viewer,
  frame,
}: {
  label: string;
  viewer: RefObject<OpenSeadragon.Viewer | null>;
  frame: RefObject<HTMLElement | null>;
}) {
  const zoom = (factor: number) => {
    const viewport = viewer.current?.viewport;
    if (!viewport) return;
    viewport.zoomBy(factor);
    viewport.applyConstraints();
  };
  const isFullScreen = useIsFullScreen(frame);
  const toggleFullScreen = () => {
    if (document.fullscreenElement) void document.exitFullscreen();
    else void frame.current?.requestFullscreen();
  };
  return (
    <span role="group" aria-label={`Zoom ${label}`} className="flex gap-1">
      <button type="button" className={controlClass} onClick={() => zoom(1.6)} aria-label="Zoom in">
        +
      </button>
      <button
        type="button"
        className={controlClass}
        onClick={() => zoom(1 / 1.6)}
        aria-label="Zoom out"
      >
        −
      </button>
      <button
        type="button"
        className={controlClass}
        onClick={() => viewer.current?.viewport.goHome()}
      >
        Reset
      </button>
      <button type="button" className={controlClass} onClick={toggleFullScreen}>
        {isFullScreen ? 'Leave full screen' : 'Full screen'}
      </button>
    </span>
  );
}
