import { useRef, useState, type PointerEvent } from 'react';
import type { ImageArea } from '@shared/schemas/condition';
import { KeyboardArea } from './keyboard-area';

const clamp = (value: number) => Math.min(1, Math.max(0, value));

/**
 * An image on which a drag marks one rectangle, kept as fractions of the image's size; the
 * keyboard does the same through KeyboardArea.
 */
export function AreaMarker({
  src,
  alt,
  area,
  onChange,
}: {
  src: string;
  alt: string;
  area: ImageArea | null;
  onChange: (area: ImageArea | null) => void;
}) {
  const box = useRef<HTMLDivElement>(null);
  const [start, setStart] = useState<{ x: number; y: number } | null>(null);
  const point = (event: PointerEvent) => {
    const rect = box.current!.getBoundingClientRect();
    return {
      x: clamp((event.clientX - rect.left) / rect.width),
      y: clamp((event.clientY - rect.top) / rect.height),
    };
  };
  const move = (event: PointerEvent) => {
    if (!start) return;
    const now = point(event);
    const width = Math.abs(now.x - start.x);
    const height = Math.abs(now.y - start.y);
    if (width > 0.01 && height > 0.01) {
      onChange({ x: Math.min(now.x, start.x), y: Math.min(now.y, start.y), width, height });
    }
  };
  return (
    <KeyboardArea area={area} label={alt} onKeep={onChange}>
      {(shown, draft) => (
        <div
          ref={box}
          className="relative inline-block cursor-crosshair touch-none select-none"
          onPointerDown={(event) => {
            event.currentTarget.setPointerCapture(event.pointerId);
            setStart(point(event));
          }}
          onPointerMove={move}
          onPointerUp={() => setStart(null)}
        >
          <img src={src} alt={alt} draggable={false} className="block max-h-64 max-w-full" />
          {shown && (
            <span
              aria-hidden="true"
              className={`absolute border-2 border-alert ${draft ? 'border-dashed' : ''}`}
              style={{
                left: `${shown.x * 100}%`,
                top: `${shown.y * 100}%`,
                width: `${shown.width * 100}%`,
                height: `${shown.height * 100}%`,
              }}
            />
          )}
        </div>
      )}
    </KeyboardArea>
  );
}
