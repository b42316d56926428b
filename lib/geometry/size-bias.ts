import ClipperLib from 'clipper-lib';
import { fromPath, toPath } from './clip-region';
import { GeometryError } from './errors';
import { fracture } from './fracture';
import { cleanLoop, signedArea } from './polygon-math';

export interface SizeBiasResult {
  /** hole-free loops, counter-clockwise, at most `maxVertices` points, inside the clip, on the grid */
  polygons: Float64Array[];
  /** separate drawn shapes (connected regions, e.g. zones) before the bias */
  shapesBefore: number;
  /** separate drawn shapes after the bias and the clip: fewer when growing shapes touch and merge */
  shapesAfter: number;
  /** shapes that a negative bias erased completely */
  shapesLost: number;
  /** shapes that a positive bias joined to a neighbour (three zones grown into one count two) */
  shapesMerged: number;
}

/**
 * Mitred joins, limit 2 (Clipper's own default): the zone outlines are chord polygons whose vertices
 * turn by a few degrees, where a mitre moves the edge exactly parallel and adds no points (round joins
 * would add arc points at many vertices for no gain at the chord tolerance), and square corners of
 * rectangular features stay square, as sizing Manhattan data usually does (common practice, no
 * source). Corners sharper than ~60° are squared off at twice the offset instead of spiking out.
 */
const MITRE_LIMIT = 2;

/** A union result as shapes: each outer outline with its own holes; islands inside holes are shapes too. */
function shapesOf(tree: ClipperLib.PolyNode): ClipperLib.Paths[] {
  const shapes: ClipperLib.Paths[] = [];
  const visit = (node: ClipperLib.PolyNode) => {
    for (const outer of node.Childs()) {
      const holes = outer.Childs();
      shapes.push([outer.Contour(), ...holes.map((h) => h.Contour())]);
      holes.forEach(visit);
    }
  };
  visit(tree);
  return shapes;
}

function union(paths: ClipperLib.Paths): ClipperLib.PolyTree {
  const c = new ClipperLib.Clipper();
  c.AddPaths(paths, ClipperLib.PolyType.ptSubject, true);
  const tree = new ClipperLib.PolyTree();
  c.Execute(ClipperLib.ClipType.ctUnion, tree, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return tree;
}

function intersection(paths: ClipperLib.Paths, clip: ClipperLib.Paths): ClipperLib.PolyTree {
  const c = new ClipperLib.Clipper();
  c.StrictlySimple = true;
  c.AddPaths(paths, ClipperLib.PolyType.ptSubject, true);
  c.AddPaths(clip, ClipperLib.PolyType.ptClip, true);
  const tree = new ClipperLib.PolyTree();
  c.Execute(ClipperLib.ClipType.ctIntersection, tree, ClipperLib.PolyFillType.pftNonZero, ClipperLib.PolyFillType.pftNonZero);
  return tree;
}

/** Every edge moved outward by `delta` (inward when negative); the result is already a union. */
function offset(paths: ClipperLib.Paths, delta: number): ClipperLib.Paths {
  const o = new ClipperLib.ClipperOffset(MITRE_LIMIT);
  o.AddPaths(paths, ClipperLib.JoinType.jtMiter, ClipperLib.EndType.etClosedPolygon);
  const out: ClipperLib.Paths = [];
  o.Execute(out, delta);
  return out;
}

/**
 * Size bias of one layer's drawn polygons (integer database units, hole-free pieces as the mask
 * builder writes them). `bias` is the change in width of every drawn feature, in database units:
 * each edge moves outward by bias/2 (inward when negative), so a zone of width w becomes w + bias and
 * the gap between two zones g − bias.
 *
 * The pieces are first joined into whole shapes, so a shrink never opens cracks along fracture cuts.
 * Each shape is offset on its own: a shrunk shape stays inside its own outline, so this also tells
 * which shapes vanished, and Clipper's sweep is far faster over one zone than over many concentric
 * ones at once (measured: one offset of all zones of a two-focus plate took 20× longer). Only grown
 * shapes need a second union, which merges those that overlap. Each resulting shape is intersected
 * with `clip` (the aperture, so a grown zone never leaves it; strictly simple) and fractured again,
 * hole-free, under `maxVertices`.
 */
export function sizeBias(polygons: readonly ArrayLike<number>[], bias: number, clip: ClipperLib.Paths, maxVertices: number): SizeBiasResult {
  if (!Number.isFinite(bias)) throw new GeometryError(`The size bias must be a finite length, got ${bias}.`);
  const before = shapesOf(union(polygons.map(toPath)));
  const delta = bias / 2;
  let shapesLost = 0;
  const moved = before.map((shape) => {
    if (delta === 0) return shape;
    const biased = offset(shape, delta);
    if (biased.length === 0) shapesLost++;
    return biased;
  });
  const joined = delta > 0 ? shapesOf(union(moved.flat())) : moved.filter((paths) => paths.length > 0);
  const after = joined.flatMap((paths) => shapesOf(intersection(paths, clip)));
  const loops: Float64Array[] = [];
  for (const path of after.flat()) {
    const loop = cleanLoop(fromPath(path));
    if (loop && signedArea(loop) !== 0) loops.push(loop);
  }
  return {
    polygons: fracture(loops, maxVertices),
    shapesBefore: before.length,
    shapesAfter: after.length,
    shapesLost,
    shapesMerged: delta > 0 ? before.length - joined.length : 0,
  };
}
