import { GeometryError } from './errors';

interface Run {
  points: number[];
  /** x where the run starts and ends on the line */
  entry: number;
  exit: number;
}

/**
 * Cuts consistently oriented loops (drawn side on the left, holes clockwise) by the horizontal line
 * y = c into the loops of the parts below (y < c) and above (y ≥ c). Cut points are rounded to the
 * integer grid and shared by both sides, so the parts tile the input exactly. All loops of every
 * polygon the line crosses must be passed together.
 */
export function splitByHorizontalLine(loops: Float64Array[], c: number): { below: Float64Array[]; above: Float64Array[] } {
  const below: Float64Array[] = [];
  const above: Float64Array[] = [];
  const runsAbove: Run[] = [];
  const runsBelow: Run[] = [];
  for (const loop of loops) {
    const n = loop.length / 2;
    let start = -1;
    for (let i = 0; i < n; i++) {
      const prev = (i + n - 1) % n;
      if (loop[2 * prev + 1] >= c !== loop[2 * i + 1] >= c) {
        start = i;
        break;
      }
    }
    if (start < 0) {
      (loop[1] >= c ? above : below).push(loop);
      continue;
    }
    let run: Run | null = null;
    for (let k = 0; k <= n; k++) {
      const i = (start + k) % n;
      const prev = (i + n - 1) % n;
      const upHere = loop[2 * i + 1] >= c;
      if (loop[2 * prev + 1] >= c !== upHere) {
        const x0 = loop[2 * prev];
        const y0 = loop[2 * prev + 1];
        const x1 = loop[2 * i];
        const y1 = loop[2 * i + 1];
        const x = x0 + ((c - y0) * (x1 - x0)) / (y1 - y0);
        if (run) {
          run.points.push(Math.round(x), c);
          run.exit = x;
          (upHere ? runsBelow : runsAbove).push(run);
        }
        if (k === n) break;
        run = { points: [Math.round(x), c], entry: x, exit: x };
      }
      run!.points.push(loop[2 * i], loop[2 * i + 1]);
    }
  }
  above.push(...joinRuns(runsAbove, true));
  below.push(...joinRuns(runsBelow, false));
  return { below, above };
}

/**
 * Joins runs along the line: the part above walks the line towards +x from an exit to the next entry,
 * the part below towards −x (each keeps its region on the left).
 */
function joinRuns(runs: Run[], above: boolean): Float64Array[] {
  if (runs.length === 0) return [];
  const order = runs.map((_, i) => i).sort((a, b) => runs[a].entry - runs[b].entry);
  const entries = order.map((i) => runs[i].entry);
  const next = (x: number): number => {
    let lo = 0;
    let hi = entries.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (entries[mid] <= x) lo = mid + 1;
      else hi = mid;
    }
    // lo: first entry > x
    if (above) return lo < entries.length ? order[lo] : -1;
    let k = lo - 1;
    while (k >= 0 && entries[k] >= x) k--;
    return k >= 0 ? order[k] : -1;
  };
  const used = new Uint8Array(runs.length);
  const out: Float64Array[] = [];
  for (let first = 0; first < runs.length; first++) {
    if (used[first]) continue;
    const points: number[] = [];
    let current = first;
    for (;;) {
      used[current] = 1;
      for (const v of runs[current].points) points.push(v);
      const n = next(runs[current].exit);
      if (n < 0) throw new GeometryError('A polygon could not be cut for fracturing: its outline is not consistently oriented.');
      if (n === first) break;
      if (used[n]) throw new GeometryError('A polygon could not be cut for fracturing: its outline crosses itself.');
      current = n;
    }
    out.push(Float64Array.from(points));
  }
  return out;
}

/** The same cut along the vertical line x = c, by rotating a quarter turn (orientation is kept). */
export function splitByVerticalLine(loops: Float64Array[], c: number): { left: Float64Array[]; right: Float64Array[] } {
  // (x, y) → (y, −x): the line x = c becomes y' = −c, and x ≤ c becomes y' ≥ −c.
  const rotate = (l: Float64Array) => {
    const r = new Float64Array(l.length);
    for (let i = 0; i < l.length; i += 2) {
      r[i] = l[i + 1];
      r[i + 1] = -l[i];
    }
    return r;
  };
  const back = (l: Float64Array) => {
    const r = new Float64Array(l.length);
    for (let i = 0; i < l.length; i += 2) {
      r[i] = -l[i + 1];
      r[i + 1] = l[i];
    }
    return r;
  };
  const { below, above } = splitByHorizontalLine(loops.map(rotate), -c);
  return { left: above.map(back), right: below.map(back) };
}
