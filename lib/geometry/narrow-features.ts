import ClipperLib from 'clipper-lib';
import { fromPath, toPath } from './clip-region';
import { boxPath, LayerPieces } from './layer-pieces';
import { loopBounds, signedArea, type Bounds } from './polygon-math';

/** Losses of a piece under this times the width squared are left out (see narrowPlaces). */
const CRUMB = 0.01;

export interface NarrowPlace {
  /** a point of the place, grid units: its centroid, or the nearest vertex of its largest part when the centroid is off it */
  x: number;
  y: number;
  /** grid units² */
  area: number;
}

function offset(paths: ClipperLib.Paths, delta: number, arcTolerance: number): ClipperLib.Paths {
  const o = new ClipperLib.ClipperOffset(2, arcTolerance);
  o.AddPaths(paths, ClipperLib.JoinType.jtMiter, ClipperLib.EndType.etClosedPolygon);
  const out: ClipperLib.Paths = [];
  o.Execute(out, delta);
  return out;
}

/**
 * What a morphological opening by `width` (grid units) removes from polygons: shrink by half the
 * width, grow back, and keep what did not come back. Mitred joins give corners of 60° or more back
 * whole. Polygons further apart than twice the width do not affect each other.
 */
export function openingLoss(polygons: Float64Array[], width: number, arcTolerance: number): Float64Array[] {
  return lossOfPaths(polygons.map(toPath), width, arcTolerance).map(fromPath);
}

/** openingLoss on Clipper paths that do not overlap (pieces touching along an edge stay apart: unite them first). */
function lossOfPaths(original: ClipperLib.Paths, width: number, arcTolerance: number): ClipperLib.Paths {
  const half = width / 2;
  return combine(ClipperLib.ClipType.ctDifference, original, offset(offset(original, -half, arcTolerance), half, arcTolerance));
}

function combine(type: ClipperLib.ClipType, subject: ClipperLib.Paths, clip: ClipperLib.Paths): ClipperLib.Paths {
  const c = new ClipperLib.Clipper();
  c.AddPaths(subject, ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(clip, ClipperLib.PolyType.ptClip, true);
  const out: ClipperLib.Paths = [];
  c.Execute(type, out, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return out;
}

/**
 * How far (grid units) the narrow-feature tests look: the width plus twice the distance δ a drawn
 * edge may stand off the exact boundary (chord tolerance + one grid step), in whole grid steps.
 */
export function narrowReach(width: number, chordTolerance: number): number {
  return Math.ceil(width + 2 * (chordTolerance + 1));
}

/**
 * Places of a layer's drawn pattern narrower than `width` (grid units): the connected parts of what
 * the opening of the union of the pieces removes, each once, with an area of at least a quarter of
 * the width squared (sharp tips lose a little area). Only pieces `opened` says may hold one are
 * opened (narrow-candidates.ts proves the rest lose less than that alone).
 *
 * The pieces are opened one by one, which is cheap, and corrected where they touch. Why that is exact,
 * for a point p of piece P (disk reasoning; clipper-lib's mitred offsets each reach at most 2·(w/2),
 * so what the opening does at p depends only on the pattern within 2w of p):
 * 1. The union's opening holds P's (opening grows with the set), so the union loses at most what P
 *    alone loses. The union keeps p only through a disk of radius w/2 inside the union but not inside
 *    P; that disk holds p and crosses P's outline where P touches another piece, so p lies within w of
 *    an edge P shares with another piece (a cut). Pieces apart from P, however close, change nothing.
 * 2. So P's losses further than R = 2·reach from its shared edges are the union's. The cores are the
 *    boxes R around the shared edges near P's losses (joined along a cut, at most 32·reach long).
 *    In each, the union is cut from the layer's pieces in the core grown by R
 *    (LayerPieces.unionInBox) and opened; the window's own edges lie R ≥ 2w from the core, so what
 *    it loses in the core is what the whole union loses there.
 * 3. A place is made of the cores' parts and the losses outside every core. Their connections lie
 *    along the cores' edges, so only the stubs (a loss's strip 4 grid steps wide along a core) are
 *    united with the cores' parts; each loss joins the united shape holding its stubs, with its own
 *    area. Each place is then reported once, however many pieces and cores it runs through.
 * A shared edge that is not recognised (LayerPieces.sharesEdge) only leaves a piece's own loss there
 * (a wedge may stay), never hides a place. A piece's losses under CRUMB·w² are dropped before
 * all this, so a place's area may be short by that much per piece it runs through. Not covered: a
 * place lying wholly in pieces the candidate test cleared, each losing less than a quarter of the
 * width squared alone, whose parts together would reach it.
 */
export function narrowPlaces(
  polygons: Float64Array[],
  opened: (polygon: Float64Array) => boolean,
  width: number,
  arcTolerance: number,
  known: ReadonlyMap<Float64Array, Float64Array[][]> = new Map(),
): NarrowPlace[] {
  const reach = 2 * narrowReach(width, arcTolerance);
  const losses: { index: number; shapes: Shape[] }[] = [];
  polygons.forEach((p, index) => {
    if (!opened(p)) return;
    const done = known.get(p);
    const shapes = done ? done.map((loops) => ({ loops, box: loopBounds(loops[0]) })) : pieceLossShapes(p, width, arcTolerance);
    if (shapes.length > 0) losses.push({ index, shapes });
  });
  const shapes = losses.flatMap((l) => l.shapes);
  if (shapes.length === 0) return [];
  // cores lie within 2R of a loss and their windows within 3R: only pieces there need indexing
  const lossBoxes = new BoxGrid(8 * reach, shapes.map((s) => grow(s.box, 3 * reach)));
  const pieces = new LayerPieces(polygons, 8 * reach, (box) => lossBoxes.meets(box));
  const found = losses.flatMap(({ index, shapes: lost }) => sharedEdgeCores(pieces, index, new BoxGrid(8 * reach, lost.map((s) => grow(s.box, reach))), reach));
  const cores = new BoxGrid(8 * reach, mergeAligned(found, 32 * reach));
  const places: NarrowPlace[] = [];
  const keep = (place: NarrowPlace) => place.area >= 0.25 * width * width && places.push(place);
  // Parts outside the cores keep their area; only their stubs, the strip of them along a core's
  // edge, are united with the cores' parts to see which belong together (uniting whole parts costs
  // several times more).
  const far: { shape: Shape; stubs: ClipperLib.Paths }[] = [];
  const joining: ClipperLib.Paths = [];
  for (const shape of shapes) {
    const met = cores.meeting(shape.box);
    if (met.length === 0) {
      keep(placeOf([shape]));
      continue;
    }
    for (const part of combineShapes(ClipperLib.ClipType.ctDifference, shape.loops.map(toPath), met.map(boxPath))) {
      const stubs = combine(ClipperLib.ClipType.ctIntersection, part.loops.map(toPath), met.map((c) => boxPath(grow(c, 4))));
      if (stubs.length === 0) keep(placeOf([part]));
      else {
        far.push({ shape: part, stubs });
        joining.push(...stubs);
      }
    }
  }
  for (const core of cores.boxes) {
    const lost = lossOfPaths(pieces.unionInBox(grow(core, reach)), width, arcTolerance);
    if (lost.length > 0) joining.push(...combine(ClipperLib.ClipType.ctIntersection, lost, [boxPath(core)]));
  }
  const joined = unite(joining);
  // a place's parts: joined shapes and the far parts whose stubs they hold (less the stubs, held twice)
  const group = joined.map((_, k) => k);
  const root = (k: number): number => (group[k] === k ? k : (group[k] = root(group[k])));
  const sum = joined.map((j) => moments(j.loops));
  const members: Shape[][] = joined.map((j) => [j]);
  for (const f of far) {
    let first = -1;
    for (const stub of f.stubs) {
      if (!ClipperLib.Clipper.Orientation(stub)) continue;
      const k = joined.findIndex((j) => inShape(j, stub[0].X, stub[0].Y));
      if (k < 0) continue;
      if (first < 0) first = k;
      else if (root(k) !== root(first)) group[root(k)] = root(first);
    }
    if (first < 0) {
      keep(placeOf([f.shape]));
      continue;
    }
    const whole = moments(f.shape.loops);
    const held = moments(f.stubs.map(fromPath));
    sum[first] = { a: sum[first].a + whole.a - held.a, mx: sum[first].mx + whole.mx - held.mx, my: sum[first].my + whole.my - held.my };
    members[first].push(f.shape);
  }
  const byRoot = new Map<number, { m: Moments; shapes: Shape[] }>();
  joined.forEach((_, k) => {
    const r = root(k);
    const t = byRoot.get(r);
    if (!t) byRoot.set(r, { m: sum[k], shapes: members[k] });
    else {
      t.m = { a: t.m.a + sum[k].a, mx: t.m.mx + sum[k].mx, my: t.m.my + sum[k].my };
      t.shapes.push(...members[k]);
    }
  });
  for (const { m, shapes: parts } of byRoot.values()) keep(placeAt(m, parts));
  return places;
}

/**
 * What the opening takes from one piece on its own, as connected parts (outer loop, then holes).
 * Most losses are slivers one grid step thin along edges (offsets round to the grid) or tips; one
 * under a hundredth of the width squared changes no place's area by more than that and is dropped.
 */
function pieceLossShapes(piece: Float64Array, width: number, arcTolerance: number): Shape[] {
  return lossShapes([toPath(piece)], width, arcTolerance).filter((s) => shapeArea(s) >= CRUMB * width * width);
}

/** pieceLossShapes as plain loops, for tiles that open their own pieces (on their own thread) before narrowPlaces joins them. */
export function pieceLosses(piece: Float64Array, width: number, arcTolerance: number): Float64Array[][] {
  return pieceLossShapes(piece, width, arcTolerance).map((s) => s.loops);
}

/** A connected part of a set: its outer loop (counter-clockwise), then its holes (flat, so many stay small), and its box. */
interface Shape {
  loops: Float64Array[];
  box: Bounds;
}

/** A boolean operation (non-zero), as shapes. */
function combineShapes(type: ClipperLib.ClipType, subject: ClipperLib.Paths, clip: ClipperLib.Paths): Shape[] {
  const tree = new ClipperLib.PolyTree();
  const c = new ClipperLib.Clipper();
  c.AddPaths(subject, ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(clip, ClipperLib.PolyType.ptClip, true);
  c.Execute(type, tree, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return shapesOf(tree);
}

const unite = (paths: ClipperLib.Paths) => combineShapes(ClipperLib.ClipType.ctUnion, paths, []);

const shapeArea = (s: Shape) => s.loops.reduce((a, l) => a + signedArea(l), 0);

/** Whether the point lies in the shape or on its outline. */
const inShape = (s: Shape, x: number, y: number) =>
  x >= s.box.x0 && x <= s.box.x1 && y >= s.box.y0 && y <= s.box.y1 && pointInLoop(s.loops[0], x, y) !== 0 && s.loops.slice(1).every((h) => pointInLoop(h, x, y) !== 1);

/** 1 inside the loop, −1 on its outline, 0 outside (crossings of a ray towards +x; exact on the integer grid). */
function pointInLoop(loop: Float64Array, x: number, y: number): number {
  let inside = false;
  for (let i = 0, j = loop.length - 2; i < loop.length; j = i, i += 2) {
    const xi = loop[i];
    const yi = loop[i + 1];
    const xj = loop[j];
    const yj = loop[j + 1];
    if ((x - xj) * (yi - yj) === (y - yj) * (xi - xj) && x >= Math.min(xi, xj) && x <= Math.max(xi, xj) && y >= Math.min(yi, yj) && y <= Math.max(yi, yj)) return -1;
    if (yi > y !== yj > y && x < xj + ((y - yj) * (xi - xj)) / (yi - yj)) inside = !inside;
  }
  return inside ? 1 : 0;
}

/**
 * Overlapping boxes joined where that covers no more than the two did (boxes along one cut line)
 * and stays shorter than `longest`, so one window serves a run of shared edges; boxes crossing each
 * other stay apart, and windows stay small enough that few pieces reach into each.
 */
function mergeAligned(boxes: Bounds[], longest: number): Bounds[] {
  const seen = new Set<string>();
  let current = boxes.filter((b) => {
    const key = `${b.x0},${b.y0},${b.x1},${b.y1}`;
    return !seen.has(key) && seen.add(key);
  });
  const area = (b: Bounds) => (b.x1 - b.x0) * (b.y1 - b.y0);
  for (let joined = true; joined; ) {
    joined = false;
    current.sort((a, b) => a.x0 - b.x0 || a.y0 - b.y0);
    const out: Bounds[] = [];
    const gone = new Uint8Array(current.length);
    for (let i = 0; i < current.length; i++) {
      if (gone[i]) continue;
      let a = current[i];
      for (let j = i + 1; j < current.length && current[j].x0 <= a.x1; j++) {
        if (gone[j] || !boxesMeet(a, current[j])) continue;
        const both = joinBoxes(a, current[j]);
        if (area(both) > area(a) + area(current[j]) || Math.max(both.x1 - both.x0, both.y1 - both.y0) > longest) continue;
        a = both;
        gone[j] = 1;
        joined = true;
      }
      out.push(a);
    }
    current = out;
  }
  return current;
}

function shapesOf(tree: ClipperLib.PolyTree): Shape[] {
  const out: Shape[] = [];
  const visit = (node: ClipperLib.PolyNode) => {
    for (const child of node.Childs()) {
      if (!child.IsHole()) {
        const outer = fromPath(child.Contour());
        out.push({ loops: [outer, ...child.Childs().map((h) => fromPath(h.Contour()))], box: loopBounds(outer) });
      }
      visit(child);
    }
  };
  visit(tree);
  return out;
}

/** What the opening removes, as shapes; united into a tree only when there are holes (rare; the tree costs more). */
function lossShapes(original: ClipperLib.Paths, width: number, arcTolerance: number): Shape[] {
  const lost = lossOfPaths(original, width, arcTolerance);
  if (lost.every((loop) => ClipperLib.Clipper.Orientation(loop))) return lost.map((path) => {
    const outer = fromPath(path);
    return { loops: [outer], box: loopBounds(outer) };
  });
  const tree = new ClipperLib.PolyTree();
  const c = new ClipperLib.Clipper();
  c.AddPaths(lost, ClipperLib.PolyType.ptSubject, true);
  c.Execute(ClipperLib.ClipType.ctUnion, tree, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return shapesOf(tree);
}

/** Boxes on a grid, so those meeting a box are found quickly. */
class BoxGrid {
  private readonly cells = new Map<number, Bounds[]>();
  constructor(
    private readonly cell: number,
    readonly boxes: Bounds[],
  ) {
    for (const b of boxes) {
      this.forCells(b, (k) => {
        const list = this.cells.get(k);
        if (list) list.push(b);
        else this.cells.set(k, [b]);
      });
    }
  }

  meets(b: Bounds): boolean {
    const cells = (Math.floor(b.x1 / this.cell) - Math.floor(b.x0 / this.cell) + 1) * (Math.floor(b.y1 / this.cell) - Math.floor(b.y0 / this.cell) + 1);
    if (cells > this.boxes.length) return this.boxes.some((c) => boxesMeet(b, c));
    for (let cx = Math.floor(b.x0 / this.cell); cx <= Math.floor(b.x1 / this.cell); cx++) {
      for (let cy = Math.floor(b.y0 / this.cell); cy <= Math.floor(b.y1 / this.cell); cy++) {
        if (this.cells.get(cellKey(cx, cy))?.some((c) => boxesMeet(b, c))) return true;
      }
    }
    return false;
  }

  meeting(b: Bounds): Bounds[] {
    const cells = (Math.floor(b.x1 / this.cell) - Math.floor(b.x0 / this.cell) + 1) * (Math.floor(b.y1 / this.cell) - Math.floor(b.y0 / this.cell) + 1);
    if (cells > this.boxes.length) return this.boxes.filter((c) => boxesMeet(b, c));
    const out = new Set<Bounds>();
    this.forCells(b, (k) => {
      for (const c of this.cells.get(k) ?? []) if (boxesMeet(b, c)) out.add(c);
    });
    return [...out];
  }

  private forCells(b: Bounds, f: (key: number) => void): void {
    for (let cx = Math.floor(b.x0 / this.cell); cx <= Math.floor(b.x1 / this.cell); cx++) {
      for (let cy = Math.floor(b.y0 / this.cell); cy <= Math.floor(b.y1 / this.cell); cy++) f(cellKey(cx, cy));
    }
  }
}

/** Cores (edge boxes grown by the reach) of the edges of piece `index` it shares with other pieces, near its losses. */
function sharedEdgeCores(pieces: LayerPieces, index: number, near: BoxGrid, reach: number): Bounds[] {
  const p = pieces.polygons[index];
  const n = p.length / 2;
  const out: Bounds[] = [];
  pieces.forEdgesNear(index, (box) => near.meets(box), (i) => {
    if (!pieces.sharesEdge(index, i)) return;
    const j = i + 1 === n ? 0 : i + 1;
    out.push({ x0: Math.min(p[2 * i], p[2 * j]) - reach, y0: Math.min(p[2 * i + 1], p[2 * j + 1]) - reach, x1: Math.max(p[2 * i], p[2 * j]) + reach, y1: Math.max(p[2 * i + 1], p[2 * j + 1]) + reach });
  });
  return out;
}

interface Moments {
  /** area and first moments about the axes */
  a: number;
  mx: number;
  my: number;
}

/** Area and first moments of loops (holes clockwise, so they subtract). */
function moments(loops: Float64Array[]): Moments {
  let a = 0;
  let mx = 0;
  let my = 0;
  for (const loop of loops) {
    for (let i = 0, j = loop.length - 2; i < loop.length; j = i, i += 2) {
      const cross = loop[j] * loop[i + 1] - loop[i] * loop[j + 1];
      a += cross;
      mx += (loop[j] + loop[i]) * cross;
      my += (loop[j + 1] + loop[i + 1]) * cross;
    }
  }
  return { a: a / 2, mx: mx / 6, my: my / 6 };
}

/** A place made of one shape. */
const placeOf = (shapes: Shape[]): NarrowPlace => placeAt(moments(shapes.flatMap((s) => s.loops)), shapes);

/** A place of the given area at its centroid, or, when that lies outside its parts (a ring, a bend), at the vertex of its largest part nearest to it. */
function placeAt(m: Moments, parts: Shape[]): NarrowPlace {
  const x = m.mx / m.a;
  const y = m.my / m.a;
  if (parts.some((s) => inShape(s, x, y))) return { x, y, area: m.a };
  const outer = parts.reduce((a, b) => (shapeArea(b) > shapeArea(a) ? b : a)).loops[0];
  let best = 0;
  for (let i = 2; i < outer.length; i += 2) if (Math.hypot(outer[i] - x, outer[i + 1] - y) < Math.hypot(outer[best] - x, outer[best + 1] - y)) best = i;
  return { x: outer[best], y: outer[best + 1], area: m.a };
}

const cellKey = (cx: number, cy: number) => (cx + 2 ** 24) * 2 ** 26 + (cy + 2 ** 24);
const grow = (b: Bounds, d: number): Bounds => ({ x0: b.x0 - d, y0: b.y0 - d, x1: b.x1 + d, y1: b.y1 + d });
const boxesMeet = (a: Bounds, b: Bounds) => a.x0 <= b.x1 && a.x1 >= b.x0 && a.y0 <= b.y1 && a.y1 >= b.y0;
const joinBoxes = (a: Bounds, b: Bounds): Bounds => ({ x0: Math.min(a.x0, b.x0), y0: Math.min(a.y0, b.y0), x1: Math.max(a.x1, b.x1), y1: Math.max(a.y1, b.y1) });
