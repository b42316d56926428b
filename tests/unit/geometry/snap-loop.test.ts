import { describe, expect, it } from 'vitest';
import { signedArea, snapLoop } from '@/lib/geometry/polygon-math';

describe('snapping a traced loop to the grid', () => {
  it('keeps the orientation of a loop wider than the grid', () => {
    const square = Float64Array.from([0, 0, 0.01, 0, 0.01, 0.01, 0, 0.01]);
    const snapped = snapLoop(square, 1000)!;
    expect(Array.from(snapped)).toEqual([0, 0, 10, 0, 10, 10, 0, 10]);
    expect(signedArea(snapped)).toBeGreaterThan(0);
  });

  it('drops a counter-clockwise sliver thinner than the grid that rounding turns over', () => {
    // a tracer's loop of 14 nm² over 0.29 µm (measured on two lenses at duty 0.3): rounding makes it clockwise
    const sliver = Float64Array.from([198.62817, -115.95148, 198.50167, -116.16711, 198.47884, -116.20626]);
    expect(signedArea(sliver)).toBeGreaterThan(0);
    const rounded = Float64Array.from(sliver, (v) => Math.round(v * 1000));
    expect(signedArea(rounded)).toBeLessThan(0);
    expect(snapLoop(sliver, 1000)).toBeNull();
  });
});
