import { describe, expect, it } from 'vitest';
import { sparkPoints } from '../../../../src/features/tone/components/sparkline';

const ys = (points: string) => points.split(' ').map((p) => Number(p.split(',')[1]));

describe('sparkPoints', () => {
  it('keeps the highest and lowest values off the box edges (a peak touched the row border)', () => {
    const y = ys(sparkPoints([0, 1.2, 4.8], 3));
    // SVG y grows downwards: the largest value is the smallest y, drawn 3 px inside the 22 px box.
    expect(Math.min(...y)).toBe(3);
    expect(Math.max(...y)).toBe(19);
  });

  it('scales to the threshold when every value is below it', () => {
    // 1.5 of a 3 top is half way up the 16 px band between the pads: 3 + 16 − 8.
    expect(ys(sparkPoints([0, 1.5], 3))).toEqual([19, 11]);
  });
});
