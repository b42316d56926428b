import type { CompiledDesign, Region } from '../design/types';
import { boxPolygon, exactConvexDomain, intersectConvex, regionDomain, type ConvexPolygon } from './convex-domain';
import { loopBounds } from './polygon-math';
import { regionBox } from '../design/region-box';

/** One independent unit of work: a piece of the design inside a convex part of its domain. */
export interface MaskTilePlan {
  /** index into design.pieces */
  piece: number;
  /** convex tracing domain, µm, counter-clockwise */
  domain: number[];
  /** seed lines run at anchor + (k + ½)·seedSpacing */
  anchorX: number;
  anchorY: number;
  /** the domain is the clip region itself (convex), so nothing needs clipping */
  exact: boolean;
}

/**
 * Where the design is centred: the symmetry centre, else the first focus, else the aperture's middle.
 * Lens phases have their extremum there, so tile edges through it cut every ring across its width.
 */
export function designAnchor(design: CompiledDesign): { x: number; y: number } {
  if (design.symmetryCentre) return design.symmetryCentre;
  if (design.foci.length > 0) return { x: design.foci[0].x, y: design.foci[0].y };
  const b = regionBox(design.aperture);
  return { x: 0.5 * (b.x0 + b.x1), y: 0.5 * (b.y0 + b.y1) };
}

/**
 * Splits every piece's domain into up to four quadrants around the anchor. Quadrants run on separate
 * workers, and their edges are fracture cuts that cross lens zones at right angles.
 */
export function planMaskTiles(design: CompiledDesign, chordTolerance: number): MaskTilePlan[] {
  const anchor = designAnchor(design);
  const plans: MaskTilePlan[] = [];
  const apertureDomain = regionDomain(design.aperture);
  design.pieces.forEach((piece, index) => {
    const clip: Region = piece.region ? { kind: 'intersection', parts: [design.aperture, piece.region] } : design.aperture;
    const exactDomain = exactConvexDomain(clip, chordTolerance);
    const domain: ConvexPolygon =
      exactDomain ?? (piece.region ? intersectConvex(apertureDomain, regionDomain(piece.region)) : apertureDomain);
    if (domain.length < 6) return;
    const { x0, y0, x1, y1 } = loopBounds(domain);
    // Only a lens centre makes a good cut; a design without one (a bare spiral phase, a grating)
    // may have a boundary running along the cut, so it stays in one tile.
    const centred = design.symmetryCentre !== null || design.foci.length > 0;
    const xs = centred && anchor.x > x0 && anchor.x < x1 ? [x0, anchor.x, x1] : [x0, x1];
    const ys = centred && anchor.y > y0 && anchor.y < y1 ? [y0, anchor.y, y1] : [y0, y1];
    for (let i = 0; i + 1 < xs.length; i++) {
      for (let j = 0; j + 1 < ys.length; j++) {
        const part = intersectConvex(domain, boxPolygon({ x0: xs[i], y0: ys[j], x1: xs[i + 1], y1: ys[j + 1] }));
        if (part.length >= 6) plans.push({ piece: index, domain: Array.from(part), anchorX: anchor.x, anchorY: anchor.y, exact: exactDomain !== null });
      }
    }
  });
  return plans;
}
