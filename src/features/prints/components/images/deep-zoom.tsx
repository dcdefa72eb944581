import OpenSeadragon from 'openseadragon';
import { useEffect, useRef, useState } from 'react';
import type { SampleRegionInput } from '@shared/schemas/asset';
import { ZoomControls } from './zoom-controls';

export interface DeepZoomProps {
  /** The IIIF Image API service's `info.json`. */
  infoUrl: string;
  label: string;
  /** Full pixel size of the original, to keep a drawn region inside it. */
  imageSize: { width: number; height: number };
  /** Called with this viewer when it opens, and null when it closes (for linked zoom). */
  onViewer?: (viewer: OpenSeadragon.Viewer | null) => void;
  /** While set, a drag draws a rectangle instead of panning. */
  onRegion?: (region: SampleRegionInput) => void;
}

interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}

/**
 * One deep-zoom image through OpenSeadragon (bundled, no CDN) from our IIIF service, with
 * our own controls. Wheel, pinch, drag and OpenSeadragon's keys (+ − 0 and arrows) work
 * once the image has focus.
 */
export default function DeepZoom({ infoUrl, label, imageSize, onViewer, onRegion }: DeepZoomProps) {
  const frame = useRef<HTMLDivElement>(null);
  const canvas = useRef<HTMLDivElement>(null);
  const viewerRef = useRef<OpenSeadragon.Viewer | null>(null);
  const [failed, setFailed] = useState(false);
  const [box, setBox] = useState<Box | null>(null);
  const regionHandler = useRef(onRegion);
  useEffect(() => {
    regionHandler.current = onRegion;
  }, [onRegion]);

  useEffect(() => {
    if (!canvas.current) return;
    const viewer = OpenSeadragon({
      element: canvas.current,
      tileSources: infoUrl,
      showNavigationControl: false,
      showNavigator: false,
      gestureSettingsMouse: { clickToZoom: false, dblClickToZoom: true },
      visibilityRatio: 0.6,
      minZoomImageRatio: 0.8,
      maxZoomPixelRatio: 2,
      animationTime: 0.6,
      loadTilesWithAjax: true,
      ajaxWithCredentials: true,
    });
    viewer.addHandler('open-failed', () => setFailed(true));
    const stopRefitting = refitAfterFullScreen(viewer, () => frame.current);
    viewerRef.current = viewer;
    onViewer?.(viewer);
    return () => {
      stopRefitting();
      onViewer?.(null);
      viewer.destroy();
      viewerRef.current = null;
    };
    // The viewer is rebuilt only for another image; the callback is read at open time.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [infoUrl]);

  const sampling = Boolean(onRegion);
  useEffect(() => {
    const viewer = viewerRef.current;
    if (!viewer || !sampling) return;
    viewer.setMouseNavEnabled(false);
    let start: OpenSeadragon.Point | null = null;
    const tracker = new OpenSeadragon.MouseTracker({
      element: viewer.canvas,
      pressHandler: (event) => {
        start = event.position as OpenSeadragon.Point;
        setBox(null);
      },
      dragHandler: (event) => {
        if (!start) return;
        const now = event.position as OpenSeadragon.Point;
        setBox({
          left: Math.min(start.x, now.x),
          top: Math.min(start.y, now.y),
          width: Math.abs(now.x - start.x),
          height: Math.abs(now.y - start.y),
        });
      },
      releaseHandler: (event) => {
        if (!start) return;
        const end = event.position as OpenSeadragon.Point;
        const a = viewer.viewport.viewerElementToImageCoordinates(start);
        const b = viewer.viewport.viewerElementToImageCoordinates(end);
        start = null;
        const clamp = (value: number, max: number) => Math.min(max, Math.max(0, Math.round(value)));
        const x0 = clamp(Math.min(a.x, b.x), imageSize.width);
        const y0 = clamp(Math.min(a.y, b.y), imageSize.height);
        const x1 = clamp(Math.max(a.x, b.x), imageSize.width);
        const y1 = clamp(Math.max(a.y, b.y), imageSize.height);
        if (x1 - x0 >= 1 && y1 - y0 >= 1) {
          regionHandler.current?.({ x: x0, y: y0, width: x1 - x0, height: y1 - y0 });
        }
      },
    });
    return () => {
      tracker.destroy();
      // Leaving the page while sampling destroys the viewer first (the effect above):
      // a destroyed viewer has no mouse tracker left to switch back on.
      if (viewerRef.current === viewer) viewer.setMouseNavEnabled(true);
      setBox(null);
    };
  }, [sampling, imageSize.width, imageSize.height, infoUrl]);

  // The image takes what the box leaves after the control bar (two lines on a phone): a
  // fixed minimum as tall as the box used to push the bar out past its bottom edge.
  return (
    <figure ref={frame} className="relative flex h-full flex-col bg-ink/95">
      <div
        ref={canvas}
        role="img"
        aria-label={`${label}: deep zoom. Focus and use + and − to zoom, arrows to pan, 0 to reset.`}
        className={`relative min-h-48 flex-1 ${sampling ? 'cursor-crosshair' : 'cursor-grab'}`}
      >
        {box && (
          <div
            aria-hidden="true"
            className="pointer-events-none absolute z-10 border-2 border-dashed border-paper"
            style={box}
          />
        )}
      </div>
      {failed && (
        <p role="alert" className="absolute inset-x-0 top-1/2 text-center text-sm text-paper">
          The deep-zoom image could not be opened.
        </p>
      )}
      <figcaption className="flex flex-wrap items-center justify-between gap-2 bg-ink px-2 py-1 text-sm text-paper">
        <span>{label}</span>
        <ZoomControls label={label} viewer={viewerRef} frame={frame} />
      </figcaption>
    </figure>
  );
}

/**
 * Entering or leaving full screen fits the whole image to the new size: left to itself the
 * viewer keeps the zoom of the old box (scaled by its diagonal), so full screen showed a
 * corner of the image, and the small box afterwards a fragment of what full screen showed.
 * The fit waits for the viewer's own resize, which it applies to the frame after the change;
 * a later ordinary resize (a phone turned) keeps the person's zoom. Returns the unsubscribe.
 */
function refitAfterFullScreen(
  viewer: OpenSeadragon.Viewer,
  frame: () => HTMLElement | null,
): () => void {
  let wasFull = false;
  let fitPending = false;
  let resized = false;
  const onChange = () => {
    const full = document.fullscreenElement !== null && document.fullscreenElement === frame();
    if (full !== wasFull) fitPending = true;
    wasFull = full;
  };
  // 'resize' is raised before the viewer rescales its zoom; 'viewport-change' after.
  viewer.addHandler('resize', () => {
    resized = fitPending;
  });
  viewer.addHandler('viewport-change', () => {
    if (!resized) return;
    resized = false;
    fitPending = false;
    viewer.viewport.goHome(true);
  });
  document.addEventListener('fullscreenchange', onChange);
  return () => document.removeEventListener('fullscreenchange', onChange);
}
