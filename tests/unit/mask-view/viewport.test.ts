/**
 * The view transform shared by the mask view and the Compare overlay (components/mask-view/viewport.ts).
 * Checks are properties of plane geometry, stated beside each; no figures are taken from our own output.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  KEY_PAN_PX,
  ZOOM_STEP,
  panBy,
  toMask,
  toScreen,
  viewForKey,
  worldToCanvas,
  zoomAt,
  zoomLimits,
  type Viewport,
} from '@/components/mask-view/viewport';

const coordinate = fc.double({ min: -1e4, max: 1e4, noNaN: true });
const zoom = fc.double({ min: 1e-3, max: 1e3, noNaN: true });
const viewArb = fc.record({ cx: coordinate, cy: coordinate, pxPerUm: zoom });
const sizeArb = fc.record({ width: fc.integer({ min: 1, max: 4000 }), height: fc.integer({ min: 1, max: 4000 }) });
const screenArb = fc.tuple(fc.double({ min: 0, max: 4000, noNaN: true }), fc.double({ min: 0, max: 4000, noNaN: true }));
const wide = { min: 1e-9, max: 1e9 };

/** |a − b| within a relative tolerance scaled to the magnitudes involved. */
function near(a: number, b: number, scale: number): boolean {
  return Math.abs(a - b) <= 1e-9 * (1 + Math.abs(scale));
}

describe('world ↔ screen', () => {
  it('screen → world → screen and world → screen → world return the start point', () => {
    fc.assert(
      fc.property(viewArb, sizeArb, screenArb, coordinate, coordinate, (v, { width, height }, [sx, sy], x, y) => {
        const [mx, my] = toMask(v, width, height, sx, sy);
        const [bx, by] = toScreen(v, width, height, mx, my);
        const [sx2, sy2] = toScreen(v, width, height, x, y);
        const [x2, y2] = toMask(v, width, height, sx2, sy2);
        return near(bx, sx, 4000) && near(by, sy, 4000) && near(x2, x, x) && near(y2, y, y);
      }),
    );
  });

  it('puts the view centre at the canvas centre and turns the mask y axis (up) into screen y (down)', () => {
    const v: Viewport = { cx: 5, cy: -3, pxPerUm: 2 };
    expect(toScreen(v, 800, 600, 5, -3)).toEqual([400, 300]);
    // 1 µm up on the mask is 2 px up on screen, i.e. a smaller screen y.
    expect(toScreen(v, 800, 600, 5, -2)).toEqual([400, 298]);
  });

  it('the canvas transform draws every mask point where toScreen puts it, scaled by the device pixel ratio', () => {
    // A canvas transform [a, b, c, d, e, f] maps (x, y) to (a x + c y + e, b x + d y + f) (HTML Living Standard, 2-D context, from memory).
    fc.assert(
      fc.property(viewArb, sizeArb, coordinate, coordinate, fc.constantFrom(1, 1.25, 2, 3), (v, { width, height }, x, y, dpr) => {
        const [a, b, c, d, e, f] = worldToCanvas(v, width, height, dpr);
        const [sx, sy] = toScreen(v, width, height, x, y);
        const scale = dpr * (4000 + Math.abs(sx) + Math.abs(sy));
        return near(a * x + c * y + e, dpr * sx, scale) && near(b * x + d * y + f, dpr * sy, scale);
      }),
    );
  });
});

describe('zoom about the cursor', () => {
  // Elementary geometry: zooming by r about the screen point s is the homothety q ↦ s + r(q − s). Its centre s is
  // its only fixed point (the mask point under the cursor stays put) and every other point's distance from s is
  // multiplied by r, which is what zoomAt must do to the picture for r = new zoom / old zoom.
  it('keeps the mask point under the cursor fixed and scales the picture about it', () => {
    fc.assert(
      fc.property(
        viewArb,
        sizeArb,
        screenArb,
        fc.double({ min: 0.01, max: 100, noNaN: true }),
        coordinate,
        coordinate,
        (v, { width, height }, [sx, sy], factor, x, y) => {
          const after = zoomAt(v, width, height, sx, sy, factor, wide);
          const r = after.pxPerUm / v.pxPerUm;
          const [m0x, m0y] = toMask(v, width, height, sx, sy);
          const [m1x, m1y] = toMask(after, width, height, sx, sy);
          const [qx, qy] = toScreen(v, width, height, x, y);
          const [px, py] = toScreen(after, width, height, x, y);
          const scale = Math.abs(px) + Math.abs(py) + 4000;
          return (
            near(r, factor, 1) &&
            near(m1x, m0x, m0x) &&
            near(m1y, m0y, m0y) &&
            near(px, sx + r * (qx - sx), scale) &&
            near(py, sy + r * (qy - sy), scale)
          );
        },
      ),
    );
  });

  it('stops at the zoom limits and still keeps the cursor point fixed', () => {
    const v: Viewport = { cx: 0, cy: 0, pxPerUm: 1 };
    const limits = { min: 0.5, max: 4 };
    const inward = zoomAt(v, 800, 600, 700, 100, 100, limits);
    const outward = zoomAt(v, 800, 600, 700, 100, 0.01, limits);
    expect(inward.pxPerUm).toBe(4);
    expect(outward.pxPerUm).toBe(0.5);
    for (const after of [inward, outward]) {
      const [x, y] = toMask(after, 800, 600, 700, 100);
      expect(x).toBeCloseTo(300, 9); // (700 − 400) px at 1 px/µm
      expect(y).toBeCloseTo(200, 9); // (300 − 100) px, screen y down
    }
  });

  it('limits run from half the fitted zoom to the given maximum, never below the fit', () => {
    expect(zoomLimits(2, 1000)).toEqual({ min: 1, max: 1000 });
    expect(zoomLimits(2, 1)).toEqual({ min: 1, max: 2 });
    expect(zoomLimits(2)).toEqual({ min: 1, max: 2e5 });
  });
});

describe('pan and keys', () => {
  it('a drag keeps the grabbed mask point under the pointer', () => {
    fc.assert(
      fc.property(viewArb, sizeArb, screenArb, screenArb, (v, { width, height }, [sx, sy], [ex, ey]) => {
        const [gx, gy] = toMask(v, width, height, sx, sy);
        const [x, y] = toMask(panBy(v, ex - sx, ey - sy), width, height, ex, ey);
        return near(x, gx, gx) && near(y, gy, gy);
      }),
    );
  });

  it.each([
    ['ArrowLeft', KEY_PAN_PX, 0],
    ['ArrowRight', -KEY_PAN_PX, 0],
    ['ArrowUp', 0, KEY_PAN_PX],
    ['ArrowDown', 0, -KEY_PAN_PX],
  ])('%s shows more of that side: the picture moves (%d, %d) px', (key, dx, dy) => {
    const v: Viewport = { cx: 10, cy: 20, pxPerUm: 3 };
    const next = viewForKey(v, key, 800, 600, wide);
    if (next === null || next === 'fit') throw new Error(`${key} should move the view`);
    const [bx, by] = toScreen(v, 800, 600, 0, 0);
    const [ax, ay] = toScreen(next, 800, 600, 0, 0);
    expect(ax - bx).toBeCloseTo(dx, 9);
    expect(ay - by).toBeCloseTo(dy, 9);
    expect(next.pxPerUm).toBe(3);
  });

  it('+, = and − zoom about the canvas centre; 0 asks for the fit; other keys do nothing', () => {
    const v: Viewport = { cx: 10, cy: 20, pxPerUm: 3 };
    for (const [key, factor] of [['+', ZOOM_STEP], ['=', ZOOM_STEP], ['-', 1 / ZOOM_STEP]] as const) {
      const next = viewForKey(v, key, 800, 600, wide);
      if (next === null || next === 'fit') throw new Error(`${key} should zoom`);
      expect(next.pxPerUm).toBeCloseTo(3 * factor, 12);
      expect(next.cx).toBeCloseTo(10, 12);
      expect(next.cy).toBeCloseTo(20, 12);
    }
    expect(viewForKey(v, '0', 800, 600, wide)).toBe('fit');
    expect(viewForKey(v, 'a', 800, 600, wide)).toBeNull();
    expect(viewForKey(v, 'Escape', 800, 600, wide)).toBeNull();
  });
});
