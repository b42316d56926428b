/** Small helpers over flat x,y loops (Float64Array or Int32Array). */
export type FlatLoop = ArrayLike<number>;

/** Shoelace area, positive for counter-clockwise loops. */
export function signedArea(loop: FlatLoop): number {
  const n = loop.length / 2;
  let sum = 0;
  for (let i = 0, j = n - 1; i < n; j = i++) sum += loop[2 * j] * loop[2 * i + 1] - loop[2 * i] * loop[2 * j + 1];
  return 0.5 * sum;
}

export function perimeter(loop: FlatLoop): number {
  const n = loop.length / 2;
  let sum = 0;
  // sqrt of the sum of squares: Math.hypot's overflow care costs several times more and grid coordinates cannot overflow
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const dx = loop[2 * i] - loop[2 * j];
    const dy = loop[2 * i + 1] - loop[2 * j + 1];
    sum += Math.sqrt(dx * dx + dy * dy);
  }
  return sum;
}

/** 2·area/perimeter: the width of a long strip, half the diameter of a disk; the sliver measure. */
export function averageWidth(loop: FlatLoop): number {
  return (2 * Math.abs(signedArea(loop))) / perimeter(loop);
}

export interface Bounds {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

export function loopBounds(loop: FlatLoop): Bounds {
  const b = { x0: Infinity, y0: Infinity, x1: -Infinity, y1: -Infinity };
  for (let i = 0; i < loop.length; i += 2) {
    if (loop[i] < b.x0) b.x0 = loop[i];
    if (loop[i] > b.x1) b.x1 = loop[i];
    if (loop[i + 1] < b.y0) b.y0 = loop[i + 1];
    if (loop[i + 1] > b.y1) b.y1 = loop[i + 1];
  }
  return b;
}

/** Rounds to the integer grid (scale = grid points per µm), drops repeated and collinear points. */
export function snapLoop(loop: FlatLoop, scale: number): Float64Array | null {
  const n = loop.length / 2;
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    xs[i] = Math.round(loop[2 * i] * scale);
    ys[i] = Math.round(loop[2 * i + 1] * scale);
  }
  const snapped = cleanIntegerLoop(xs, ys, n);
  // a loop thinner than the grid can come out turned over (a drawn sliver as a hole): it cannot be drawn
  return snapped && Math.sign(signedArea(snapped)) === Math.sign(signedArea(loop)) ? snapped : null;
}

/** Drops repeated and collinear points of an integer loop; null when fewer than three remain. */
export function cleanLoop(loop: FlatLoop): Float64Array | null {
  const n = loop.length / 2;
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    xs[i] = loop[2 * i];
    ys[i] = loop[2 * i + 1];
  }
  return cleanIntegerLoop(xs, ys, n);
}

function cleanIntegerLoop(xs: Float64Array, ys: Float64Array, n: number): Float64Array | null {
  // A stack pass removes repeats and collinear middles; a second look fixes the wrap-around.
  const sx: number[] = [];
  const sy: number[] = [];
  const collinear = (ax: number, ay: number, bx: number, by: number, cx: number, cy: number) => (bx - ax) * (cy - ay) - (by - ay) * (cx - ax) === 0;
  for (let i = 0; i < n; i++) {
    const x = xs[i];
    const y = ys[i];
    const m = sx.length;
    if (m > 0 && sx[m - 1] === x && sy[m - 1] === y) continue;
    if (m >= 2 && collinear(sx[m - 2], sy[m - 2], sx[m - 1], sy[m - 1], x, y)) {
      sx.pop();
      sy.pop();
    }
    sx.push(x);
    sy.push(y);
  }
  let changed = true;
  while (changed && sx.length >= 3) {
    changed = false;
    const m = sx.length;
    if (sx[m - 1] === sx[0] && sy[m - 1] === sy[0]) {
      sx.pop();
      sy.pop();
      changed = true;
      continue;
    }
    if (collinear(sx[m - 2], sy[m - 2], sx[m - 1], sy[m - 1], sx[0], sy[0])) {
      sx.pop();
      sy.pop();
      changed = true;
      continue;
    }
    if (collinear(sx[m - 1], sy[m - 1], sx[0], sy[0], sx[1], sy[1])) {
      sx.shift();
      sy.shift();
      changed = true;
    }
  }
  if (sx.length < 3) return null;
  const out = new Float64Array(2 * sx.length);
  for (let i = 0; i < sx.length; i++) {
    out[2 * i] = sx[i];
    out[2 * i + 1] = sy[i];
  }
  return signedArea(out) === 0 ? null : out;
}
