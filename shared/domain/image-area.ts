/** A rectangle on an image as fractions of its width and height (0–1), as condition reports keep it. */
export interface Area {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** One arrow-key step: 2 % of the image; the smallest area is one step square (our choice). */
export const AREA_STEP = 0.02;
/** Where a keyboard marking starts when nothing is marked: the middle fifth of the image. */
export const STARTING_AREA: Area = { x: 0.4, y: 0.4, width: 0.2, height: 0.2 };

export type ArrowKey = 'ArrowLeft' | 'ArrowRight' | 'ArrowUp' | 'ArrowDown';

const clamp = (value: number, low: number, high: number) => Math.min(high, Math.max(low, value));
const tidy = (value: number) => Math.round(value * 10_000) / 10_000;

/**
 * Moves an area one step (an arrow key) or, with `resize`, grows or shrinks it from its
 * right and lower edges (Shift and an arrow key). It never leaves the image nor shrinks
 * below one step.
 */
export function nudgeArea(area: Area, key: ArrowKey, resize: boolean): Area {
  const dx = key === 'ArrowLeft' ? -AREA_STEP : key === 'ArrowRight' ? AREA_STEP : 0;
  const dy = key === 'ArrowUp' ? -AREA_STEP : key === 'ArrowDown' ? AREA_STEP : 0;
  if (resize) {
    const width = clamp(area.width + dx, AREA_STEP, 1 - area.x);
    const height = clamp(area.height + dy, AREA_STEP, 1 - area.y);
    return { ...area, width: tidy(width), height: tidy(height) };
  }
  return {
    ...area,
    x: tidy(clamp(area.x + dx, 0, 1 - area.width)),
    y: tidy(clamp(area.y + dy, 0, 1 - area.height)),
  };
}

/** The area in words for a screen reader: where it starts and how large it is, in per cent. */
export function describeArea(area: Area): string {
  const percent = (value: number) => `${Math.round(value * 100)} %`;
  return (
    `${percent(area.x)} from the left, ${percent(area.y)} from the top, ` +
    `${percent(area.width)} wide, ${percent(area.height)} high`
  );
}
