import { useRef, useState, type PointerEvent } from 'react';
import type { ImageArea } from '@shared/schemas/condition';

const clamp = (value: number) => Math.min(1, Math.max(0, value));

/** An image on which a drag marks one rectangle, kept as fractions of the image's size. */
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
      {area && (
        <span
          aria-hidden="true"
          className="absolute border-2 border-alert"
          style={{
            left: `${area.x * 100}%`,
            top: `${area.y * 100}%`,
            width: `${area.width * 100}%`,
            height: `${area.height * 100}%`,
          }}
        />
      )}
    </div>
  );
}
