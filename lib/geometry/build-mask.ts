import type { CompiledDesign } from '../design/types';
import type { LayerInfo, LayoutLibrary, LayoutPolygon } from '../layout/types';
import { layerFunctionSpecs } from './boundary-function';
import { buildMaskTile, type MaskTileResult } from './build-tile';
import { fromPath, regionPaths } from './clip-region';
import { GeometryError } from './errors';
import { fracture } from './fracture';
import { resolveMaskOptions, type MaskOptions } from './options';
import { narrowCandidates } from './narrow-candidates';
import { cleanLoop } from './polygon-math';
import { radialMaskTiles } from './radial-mask';
import { spiralMaskTiles } from './spiral-mask';
import { regionBox } from '../design/region-box';
import { validateRegion } from './region';
import { buildReport, removeSlivers, type DrawnLayer } from './report';
import type { ManufacturabilityReport } from './report-types';
import { designAnchor, planMaskTiles } from './tiles';

export interface MaskResult {
  library: LayoutLibrary;
  report: ManufacturabilityReport;
}

export function validateDesign(design: CompiledDesign): void {
  if (!(design.wavelength > 0) || !Number.isFinite(design.wavelength)) throw new GeometryError(`The wavelength must be a positive length, got ${design.wavelength} µm.`);
  if (design.pieces.length === 0) throw new GeometryError('The design has no phase profile to draw.');
  validateRegion(design.aperture, 'The aperture');
  design.pieces.forEach((p, i) => p.region && validateRegion(p.region, `The region of part ${i + 1}`));
  const b = regionBox(design.aperture);
  if (Math.max(Math.abs(b.x0), Math.abs(b.x1), Math.abs(b.y0), Math.abs(b.y1)) > 1e6) {
    throw new GeometryError('The aperture reaches more than 1 m from the origin; the mask cannot be drawn at that size.');
  }
}

/** The drawn layers of a design, in mask order. */
export function maskLayers(design: CompiledDesign, options: MaskOptions): LayerInfo[] {
  const q = design.quantization;
  if (q.kind === 'binary') return [{ ...options.layers.zones, name: 'zones', purpose: 'zones' }];
  if (options.layers.levels.length < q.bits) throw new GeometryError(`The design has ${q.bits} masks but only ${options.layers.levels.length} level layers are assigned.`);
  return Array.from({ length: q.bits }, (_, i) => ({ ...options.layers.levels[i], name: `level ${i + 1}`, purpose: 'level' as const, levelIndex: i + 1 }));
}

function toLayout(loops: Float64Array[]): LayoutPolygon[] {
  return loops.map((l) => {
    for (let i = 0; i < l.length; i++) {
      if (Math.abs(l[i]) > 2 ** 31 - 1) throw new GeometryError('A coordinate does not fit a 32-bit database value; use a coarser database unit.');
    }
    return Int32Array.from(l);
  });
}

/** Joins tile results into the library and measures the report. */
export function assembleMask(design: CompiledDesign, options: MaskOptions, tiles: MaskTileResult[]): MaskResult {
  const infos = maskLayers(design, options);
  const phaseGap = layerFunctionSpecs(design.quantization).map((s) => s.phaseGap);
  const sliverWidth = (options.minSliverWidth * 1e-6) / options.databaseUnit;
  const drawn: DrawnLayer[] = infos.map((info, k) => {
    const { kept: polygons, slivers } = removeSlivers(tiles.flatMap((t) => t.layers[k]), sliverWidth);
    const provenWide = new Set(tiles.flatMap((t) => t.provenWide[k]));
    // pieces of tiles that ran the test themselves are decided; the rest are tested here
    const decided = new Set(tiles.flatMap((t) => (t.opened[k] ? t.layers[k] : [])));
    const knownLosses = new Map(tiles.flatMap((t) => [...(t.opened[k] ?? [])]));
    const undecided = polygons.filter((p) => !provenWide.has(p) && !decided.has(p));
    const candidates = narrowCandidates(design, options, phaseGap[k], undecided, new Set(tiles.flatMap((t) => t.clipped[k])));
    return { info, polygons, slivers, mayBeNarrow: (p: Float64Array) => candidates.has(p) || knownLosses.has(p), knownLosses };
  });
  const report = buildReport(design, options, drawn, designAnchor(design));
  const scale = 1e-6 / options.databaseUnit;
  const shapes = drawn.map((d) => ({ layer: d.info.layer, datatype: d.info.datatype, polygons: toLayout(d.polygons) }));
  const layers = [...infos];
  const marker = options.layers.apertureMarker;
  if (marker) {
    const outline = regionPaths(design.aperture, scale, options.chordTolerance)
      .map((p) => cleanLoop(fromPath(p)))
      .filter((l): l is Float64Array => l !== null);
    shapes.push({ layer: marker.layer, datatype: marker.datatype, polygons: toLayout(fracture(outline, options.maxVertices, sliverWidth)) });
    layers.push({ ...marker, name: 'aperture', purpose: 'aperture' });
  }
  return {
    library: {
      name: options.name,
      databaseUnit: options.databaseUnit,
      userUnit: options.userUnit,
      layers,
      cells: [{ name: options.name, shapes, texts: [], placements: [] }],
      topCell: options.name,
    },
    report,
  };
}

/** The mask of a design whose boundaries are known in closed form (circles or spirals), else null: such designs skip the tracer. */
export function exactMaskTiles(design: CompiledDesign, options: MaskOptions): MaskTileResult[] | null {
  return radialMaskTiles(design, options) ?? spiralMaskTiles(design, options);
}

/**
 * From a compiled design to fractured integer polygons and the manufacturability report, on one
 * thread. `planMaskTiles` + `buildMaskTile` + `assembleMask` do the same work split into tiles for
 * worker threads (a worker recompiles the script, since a design holds functions).
 */
export function buildMask(design: CompiledDesign, options: Partial<MaskOptions> = {}): MaskResult {
  const resolved = resolveMaskOptions(options);
  validateDesign(design);
  const tiles = exactMaskTiles(design, resolved) ?? planMaskTiles(design, resolved.chordTolerance).map((plan) => buildMaskTile(design, resolved, plan));
  return assembleMask(design, resolved, tiles);
}
