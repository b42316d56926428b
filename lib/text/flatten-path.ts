/** One outline command, as opentype.js gives them (y up in our use). */
export type OutlineCommand =
  | { type: 'M' | 'L'; x: number; y: number }
  | { type: 'Q'; x1: number; y1: number; x: number; y: number }
  | { type: 'C'; x1: number; y1: number; x2: number; y2: number; x: number; y: number }
  | { type: 'Z' };

/**
 * Flattens outline commands into closed contours (flat x,y arrays, not repeated at the end).
 * A Bézier segment is split in halves until every control point lies within `tolerance` of the chord;
 * the curve lies inside its control polygon's convex hull, so each chord departs from it by at most `tolerance`.
 */
export function flattenOutline(commands: readonly OutlineCommand[], tolerance: number): number[][] {
  const contours: number[][] = [];
  let current: number[] = [];
  let x = 0;
  let y = 0;
  const close = () => {
    if (current.length >= 6) {
      const n = current.length;
      if (current[0] === current[n - 2] && current[1] === current[n - 1]) current.length = n - 2;
      if (current.length >= 6) contours.push(current);
    }
    current = [];
  };
  for (const command of commands) {
    switch (command.type) {
      case 'M':
        close();
        current.push(command.x, command.y);
        break;
      case 'L':
        pushPoint(current, command.x, command.y);
        break;
      case 'Q':
        flattenCubic(current, x, y, x + (2 / 3) * (command.x1 - x), y + (2 / 3) * (command.y1 - y), command.x + (2 / 3) * (command.x1 - command.x), command.y + (2 / 3) * (command.y1 - command.y), command.x, command.y, tolerance, 0);
        break;
      case 'C':
        flattenCubic(current, x, y, command.x1, command.y1, command.x2, command.y2, command.x, command.y, tolerance, 0);
        break;
      case 'Z':
        close();
        continue;
    }
    x = command.x;
    y = command.y;
  }
  close();
  return contours;
}

const MAX_DEPTH = 16;

/** A quadratic is passed as its exact cubic elevation, so one routine serves both. */
function flattenCubic(out: number[], x0: number, y0: number, x1: number, y1: number, x2: number, y2: number, x3: number, y3: number, tolerance: number, depth: number): void {
  if (depth >= MAX_DEPTH || (distanceToChord(x1, y1, x0, y0, x3, y3) <= tolerance && distanceToChord(x2, y2, x0, y0, x3, y3) <= tolerance)) {
    pushPoint(out, x3, y3);
    return;
  }
  // de Casteljau split at t = 1/2
  const ax = (x0 + x1) / 2, ay = (y0 + y1) / 2;
  const bx = (x1 + x2) / 2, by = (y1 + y2) / 2;
  const cx = (x2 + x3) / 2, cy = (y2 + y3) / 2;
  const abx = (ax + bx) / 2, aby = (ay + by) / 2;
  const bcx = (bx + cx) / 2, bcy = (by + cy) / 2;
  const mx = (abx + bcx) / 2, my = (aby + bcy) / 2;
  flattenCubic(out, x0, y0, ax, ay, abx, aby, mx, my, tolerance, depth + 1);
  flattenCubic(out, mx, my, bcx, bcy, cx, cy, x3, y3, tolerance, depth + 1);
}

function distanceToChord(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax;
  const dy = by - ay;
  const length = Math.hypot(dx, dy);
  if (length === 0) return Math.hypot(px - ax, py - ay);
  return Math.abs((px - ax) * dy - (py - ay) * dx) / length;
}

function pushPoint(out: number[], x: number, y: number): void {
  const n = out.length;
  if (n >= 2 && out[n - 2] === x && out[n - 1] === y) return;
  out.push(x, y);
}
