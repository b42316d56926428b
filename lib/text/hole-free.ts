import ClipperLib from 'clipper-lib';

type Path = ClipperLib.Path;

/**
 * Merges integer contours under the non-zero rule and cuts every remaining hole open:
 * a vertical cut through the middle of each hole's x-range splits the region into strips, and within
 * a strip a cut hole is part of the outline, not a hole. Returns hole-free, counter-clockwise polygons.
 */
export function holeFreePolygons(contours: readonly ArrayLike<number>[]): Int32Array[] {
  const paths = contours.map(toPath).filter((p) => p.length >= 3);
  const out: Int32Array[] = [];
  for (const node of unionTree(paths, ClipperLib.PolyFillType.pftNonZero)) cutIntoPieces(node, out, 0);
  return out;
}

/** Outer polygons of a union, each with its direct holes. */
function unionTree(paths: Path[], fill: ClipperLib.PolyFillType): Array<{ outer: Path; holes: Path[] }> {
  const clipper = new ClipperLib.Clipper();
  clipper.AddPaths(paths, ClipperLib.PolyType.ptSubject, true);
  const tree = new ClipperLib.PolyTree();
  clipper.Execute(ClipperLib.ClipType.ctUnion, tree, fill, fill);
  const found: Array<{ outer: Path; holes: Path[] }> = [];
  const visit = (node: ClipperLib.PolyNode) => {
    for (const child of node.Childs()) {
      if (child.IsHole()) continue;
      const holes = child.Childs().filter((h) => h.IsHole());
      found.push({ outer: child.Contour(), holes: holes.map((h) => h.Contour()) });
      // islands inside holes are further outers
      for (const hole of holes) visit(hole);
    }
  };
  visit(tree);
  return found;
}

const MAX_CUT_ROUNDS = 4;

function cutIntoPieces(node: { outer: Path; holes: Path[] }, out: Int32Array[], round: number): void {
  if (node.holes.length === 0) {
    out.push(toCounterClockwise(node.outer));
    return;
  }
  if (round >= MAX_CUT_ROUNDS) throw new Error('text outline: a hole could not be cut open');
  const cuts = [...new Set(node.holes.map(holeCut).filter((c): c is number => c !== null))].sort((a, b) => a - b);
  const xs = node.outer.map((p) => p.X);
  const edges = [Math.min(...xs) - 1, ...cuts, Math.max(...xs) + 1];
  const ys = node.outer.map((p) => p.Y);
  const y0 = Math.min(...ys) - 1;
  const y1 = Math.max(...ys) + 1;
  for (let i = 0; i + 1 < edges.length; i++) {
    const strip: Path = [{ X: edges[i], Y: y0 }, { X: edges[i + 1], Y: y0 }, { X: edges[i + 1], Y: y1 }, { X: edges[i], Y: y1 }];
    const clipper = new ClipperLib.Clipper();
    clipper.AddPaths([node.outer, ...node.holes], ClipperLib.PolyType.ptSubject, true);
    clipper.AddPath(strip, ClipperLib.PolyType.ptClip, true);
    const tree = new ClipperLib.PolyTree();
    clipper.Execute(ClipperLib.ClipType.ctIntersection, tree, ClipperLib.PolyFillType.pftEvenOdd, ClipperLib.PolyFillType.pftNonZero);
    const pieces: Array<{ outer: Path; holes: Path[] }> = [];
    const visit = (parent: ClipperLib.PolyNode) => {
      for (const child of parent.Childs()) {
        if (child.IsHole()) continue;
        const holes = child.Childs().filter((h) => h.IsHole());
        pieces.push({ outer: child.Contour(), holes: holes.map((h) => h.Contour()) });
        for (const hole of holes) visit(hole);
      }
    };
    visit(tree);
    for (const piece of pieces) cutIntoPieces(piece, out, round + 1);
  }
}

/** An integer x strictly inside the hole's x-range, or null for a hole one unit wide (left to the next round's data). */
function holeCut(hole: Path): number | null {
  const xs = hole.map((p) => p.X);
  const low = Math.min(...xs);
  const high = Math.max(...xs);
  const middle = Math.floor((low + high) / 2);
  return middle > low && middle < high ? middle : null;
}

function toPath(contour: ArrayLike<number>): Path {
  const path: Path = [];
  for (let i = 0; i + 1 < contour.length; i += 2) path.push({ X: contour[i], Y: contour[i + 1] });
  return path;
}

function toCounterClockwise(path: Path): Int32Array {
  const ordered = ClipperLib.Clipper.Orientation(path) ? path : [...path].reverse();
  const out = new Int32Array(ordered.length * 2);
  ordered.forEach((p, i) => {
    out[2 * i] = p.X;
    out[2 * i + 1] = p.Y;
  });
  return out;
}
