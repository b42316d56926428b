import ClipperLib from 'clipper-lib';
import { loopBounds, type Bounds } from './polygon-math';

/** Edges per indexed run: short enough that a run's box hugs a curve, long enough that runs stay few. */
const RUN = 16;
/** Runs per group, the coarser boxes looked at first. */
const GROUP = 16;

/**
 * The pieces of one drawn layer (integer, counter-clockwise, not overlapping) with a grid over the
 * boxes of runs of RUN edges, so the drawn pattern (the union of the pieces) near a point can be had
 * without looking at whole pieces, and a map from vertices to the pieces holding them, so edges two
 * pieces share (fracture, tile and sector cuts) can be found. Only the pieces whose box meets
 * `within` are indexed: the questions must stay inside it.
 */
export class LayerPieces {
  readonly polygons: Float64Array[];
  /** per polygon, its runs' boxes: x0, y0, x1, y1 for run k (edges RUN·k … RUN·k + RUN − 1) */
  private readonly runBoxes: Float64Array[];
  /** the same for groups of GROUP runs */
  private readonly groupBoxes: Float64Array[];
  private readonly cell: number;
  private readonly cells = new Map<number, number[]>();
  /** every indexed vertex as polygon · 2^13 + vertex index (maxVertices ≤ 8191), by position */
  private readonly owners: VertexTable;
  private readonly stamp: Int32Array;
  private query = 0;

  constructor(polygons: Float64Array[], cellSize: number, within: (box: Bounds) => boolean) {
    this.polygons = polygons;
    this.cell = cellSize;
    this.stamp = new Int32Array(polygons.length);
    const indexed = polygons.map((p) => within(loopBounds(p)));
    this.runBoxes = polygons.map((p, index) => {
      const n = p.length / 2;
      const runs = indexed[index] ? Math.ceil(n / RUN) : 0;
      const boxes = new Float64Array(4 * runs);
      for (let k = 0; k < runs; k++) {
        let bx0 = Infinity;
        let by0 = Infinity;
        let bx1 = -Infinity;
        let by1 = -Infinity;
        // a run's box holds its edges' both ends: vertices RUN·k … RUN·k + RUN (the last wraps to 0)
        for (let i = RUN * k, end = Math.min(RUN * k + RUN, n); i <= end; i++) {
          const j = 2 * (i === n ? 0 : i);
          if (p[j] < bx0) bx0 = p[j];
          if (p[j] > bx1) bx1 = p[j];
          if (p[j + 1] < by0) by0 = p[j + 1];
          if (p[j + 1] > by1) by1 = p[j + 1];
        }
        boxes[4 * k] = bx0;
        boxes[4 * k + 1] = by0;
        boxes[4 * k + 2] = bx1;
        boxes[4 * k + 3] = by1;
        for (let cx = Math.floor(bx0 / cellSize); cx <= Math.floor(bx1 / cellSize); cx++) {
          for (let cy = Math.floor(by0 / cellSize); cy <= Math.floor(by1 / cellSize); cy++) {
            const c = cellKey(cx, cy);
            const list = this.cells.get(c);
            if (list) {
              if (list[list.length - 1] !== index) list.push(index);
            } else this.cells.set(c, [index]);
          }
        }
      }
      return boxes;
    });
    this.groupBoxes = this.runBoxes.map((boxes) => {
      const runs = boxes.length / 4;
      const groups = new Float64Array(4 * Math.ceil(runs / GROUP));
      for (let g = 0; 4 * g < groups.length; g++) {
        groups.set([Infinity, Infinity, -Infinity, -Infinity], 4 * g);
        for (let k = GROUP * g; k < Math.min(GROUP * g + GROUP, runs); k++) {
          groups[4 * g] = Math.min(groups[4 * g], boxes[4 * k]);
          groups[4 * g + 1] = Math.min(groups[4 * g + 1], boxes[4 * k + 1]);
          groups[4 * g + 2] = Math.max(groups[4 * g + 2], boxes[4 * k + 2]);
          groups[4 * g + 3] = Math.max(groups[4 * g + 3], boxes[4 * k + 3]);
        }
      }
      return groups;
    });
    let count = 0;
    polygons.forEach((p, index) => {
      if (indexed[index]) count += p.length / 2;
    });
    this.owners = new VertexTable(count);
    polygons.forEach((p, index) => {
      if (!indexed[index]) return;
      for (let i = 0; i < p.length / 2; i++) this.owners.add(p[2 * i], p[2 * i + 1], index * 8192 + i);
    });
  }

  /**
   * The drawn pattern inside the box, as Clipper paths (outer loops counter-clockwise, holes
   * clockwise). A run whose box misses the box lies in one open half-plane outside it, so it is
   * replaced by the chord between its ends: the loop the two make lies in that half-plane too, so
   * winding numbers inside the box, and with them the union there, do not change.
   */
  unionInBox(b: Bounds): ClipperLib.Paths {
    const subject: ClipperLib.Paths = [];
    this.query++;
    for (let cx = Math.floor(b.x0 / this.cell); cx <= Math.floor(b.x1 / this.cell); cx++) {
      for (let cy = Math.floor(b.y0 / this.cell); cy <= Math.floor(b.y1 / this.cell); cy++) {
        for (const index of this.cells.get(cellKey(cx, cy)) ?? []) {
          if (this.stamp[index] === this.query) continue;
          this.stamp[index] = this.query;
          const path = this.reducedPath(index, b);
          if (path) subject.push(path);
        }
      }
    }
    const c = new ClipperLib.Clipper();
    c.AddPaths(subject, ClipperLib.PolyType.ptSubject, true);
    c.AddPath(boxPath(b), ClipperLib.PolyType.ptClip, true);
    const out: ClipperLib.Paths = [];
    c.Execute(ClipperLib.ClipType.ctIntersection, out, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
    return out;
  }

  /**
   * The polygon with its runs away from the box replaced by chords; null when no run meets the box.
   * Runs are looked at GROUP at a time first, so a long polygon mostly far from the box costs little.
   */
  private reducedPath(index: number, b: Bounds): ClipperLib.Path | null {
    const p = this.polygons[index];
    const boxes = this.runBoxes[index];
    const groups = this.groupBoxes[index];
    const n = p.length / 2;
    const runs = boxes.length / 4;
    const path: ClipperLib.Path = [];
    let meets = false;
    for (let g = 0; 4 * g < groups.length; g++) {
      if (!boxMeets(groups, g, b)) {
        path.push({ X: p[2 * RUN * GROUP * g], Y: p[2 * RUN * GROUP * g + 1] });
        continue;
      }
      for (let k = GROUP * g; k < Math.min(GROUP * g + GROUP, runs); k++) {
        const inside = boxMeets(boxes, k, b);
        meets ||= inside;
        const end = inside ? Math.min(RUN * k + RUN, n) : RUN * k + 1;
        for (let i = RUN * k; i < end; i++) path.push({ X: p[2 * i], Y: p[2 * i + 1] });
      }
    }
    return meets ? path : null;
  }

  /** Calls f with the index of every edge of polygon `index` in a run whose box `near` accepts. */
  forEdgesNear(index: number, near: (box: Bounds) => boolean, f: (edge: number) => void): void {
    const boxes = this.runBoxes[index];
    const n = this.polygons[index].length / 2;
    for (let k = 0; 4 * k < boxes.length; k++) {
      if (!near({ x0: boxes[4 * k], y0: boxes[4 * k + 1], x1: boxes[4 * k + 2], y1: boxes[4 * k + 3] })) continue;
      for (let i = RUN * k; i < Math.min(RUN * k + RUN, n); i++) f(i);
    }
  }

  /**
   * Whether edge i of polygon `index` (vertex i to i + 1) is shared with another piece: that piece
   * runs back along it from one of its ends. Ends are matched exactly, and for axis-parallel edges
   * (tile and fracture cuts, whose two sides are found separately and may differ by one grid step)
   * also one step off.
   */
  sharesEdge(index: number, i: number): boolean {
    const p = this.polygons[index];
    const n = p.length / 2;
    const j = i + 1 === n ? 0 : i + 1;
    const ax = p[2 * i];
    const ay = p[2 * i + 1];
    const bx = p[2 * j];
    const by = p[2 * j + 1];
    if (this.runsBack(index, ax, ay, bx, by, 0, 0) || this.runsBack(index, bx, by, ax, ay, 0, 0)) return true;
    if (ax !== bx && ay !== by) return false;
    for (let dx = -1; dx <= 1; dx++) {
      for (let dy = -1; dy <= 1; dy++) {
        if ((dx !== 0 || dy !== 0) && (this.runsBack(index, ax, ay, bx, by, dx, dy) || this.runsBack(index, bx, by, ax, ay, dx, dy))) return true;
      }
    }
    return false;
  }

  /**
   * Whether another polygon has a vertex at (sx + dx, sy + dy) with an edge from there that runs
   * along the segment s → t (within two grid steps of its line, pointing the same way). For the end
   * b of P's edge a → b, the neighbour leaves b towards a; for the end a it arrives from b, which is
   * the edge leaving a backwards, so both are tested as "an edge at the vertex pointing along".
   */
  private runsBack(index: number, sx: number, sy: number, tx: number, ty: number, dx: number, dy: number): boolean {
    const ux = tx - sx;
    const uy = ty - sy;
    const length = Math.sqrt(ux * ux + uy * uy);
    return this.owners.some(sx + dx, sy + dy, (code) => {
      const q = Math.floor(code / 8192);
      if (q === index) return false;
      const poly = this.polygons[q];
      const m = poly.length / 2;
      const v = code % 8192;
      const vx = poly[2 * v];
      const vy = poly[2 * v + 1];
      for (const w of [v + 1 === m ? 0 : v + 1, v === 0 ? m - 1 : v - 1]) {
        const wx = poly[2 * w] - vx;
        const wy = poly[2 * w + 1] - vy;
        if (ux * wx + uy * wy > 0 && Math.abs(ux * wy - uy * wx) <= 2 * length) return true;
      }
      return false;
    });
  }
}

/** Integer points with a code each (several codes may share a point), in an open-addressing table. */
class VertexTable {
  private readonly xs: Int32Array;
  private readonly ys: Int32Array;
  private readonly codes: Float64Array;
  private readonly mask: number;

  constructor(count: number) {
    let size = 16;
    while (size < 2 * count) size *= 2;
    this.xs = new Int32Array(size);
    this.ys = new Int32Array(size);
    this.codes = new Float64Array(size).fill(-1);
    this.mask = size - 1;
  }

  private slot(x: number, y: number): number {
    return (Math.imul(x, 73856093) ^ Math.imul(y, 19349663)) & this.mask;
  }

  add(x: number, y: number, code: number): void {
    let i = this.slot(x, y);
    while (this.codes[i] !== -1) i = (i + 1) & this.mask;
    this.xs[i] = x;
    this.ys[i] = y;
    this.codes[i] = code;
  }

  /** Whether f holds for a code at (x, y). */
  some(x: number, y: number, f: (code: number) => boolean): boolean {
    for (let i = this.slot(x, y); this.codes[i] !== -1; i = (i + 1) & this.mask) {
      if (this.xs[i] === x && this.ys[i] === y && f(this.codes[i])) return true;
    }
    return false;
  }
}

/** Whether box k of a flat x0, y0, x1, y1 list meets b. */
const boxMeets = (boxes: Float64Array, k: number, b: Bounds) => boxes[4 * k] <= b.x1 && boxes[4 * k + 2] >= b.x0 && boxes[4 * k + 1] <= b.y1 && boxes[4 * k + 3] >= b.y0;

const cellKey = (cx: number, cy: number) => (cx + 2 ** 24) * 2 ** 26 + (cy + 2 ** 24);

export function boxPath(b: Bounds): ClipperLib.Path {
  return [
    { X: b.x0, Y: b.y0 },
    { X: b.x1, Y: b.y0 },
    { X: b.x1, Y: b.y1 },
    { X: b.x0, Y: b.y1 },
  ];
}
