import { describe, expect, it } from 'vitest';
import { ImageAreaSchema } from '../../../shared/schemas/condition';
import { describeArea, nudgeArea, STARTING_AREA } from '../../../shared/domain/image-area';

// Plain geometry on fractions of the image; checked against hand-worked values and against
// the condition report's own schema (an area must lie inside the image).
describe('nudgeArea', () => {
  it('moves one 2 % step per arrow key', () => {
    expect(nudgeArea(STARTING_AREA, 'ArrowRight', false)).toEqual({ ...STARTING_AREA, x: 0.42 });
    expect(nudgeArea(STARTING_AREA, 'ArrowUp', false)).toEqual({ ...STARTING_AREA, y: 0.38 });
  });

  it('resizes from the right and lower edges with Shift', () => {
    expect(nudgeArea(STARTING_AREA, 'ArrowRight', true)).toEqual({ ...STARTING_AREA, width: 0.22 });
    expect(nudgeArea(STARTING_AREA, 'ArrowUp', true)).toEqual({ ...STARTING_AREA, height: 0.18 });
  });

  it('stops at the edges of the image and at one step square', () => {
    let area = STARTING_AREA;
    for (let i = 0; i < 60; i += 1) area = nudgeArea(area, 'ArrowRight', false);
    expect(area.x + area.width).toBeCloseTo(1, 10);
    for (let i = 0; i < 60; i += 1) area = nudgeArea(area, 'ArrowLeft', true);
    expect(area.width).toBeCloseTo(0.02, 10);
    for (let i = 0; i < 60; i += 1) area = nudgeArea(area, 'ArrowDown', true);
    expect(area.y + area.height).toBeCloseTo(1, 10);
    expect(ImageAreaSchema.safeParse(area).success).toBe(true);
  });

  it('describes an area in words', () => {
    expect(describeArea(STARTING_AREA)).toBe(
      '40 % from the left, 40 % from the top, 20 % wide, 20 % high',
    );
  });
});
