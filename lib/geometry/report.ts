import type { CompiledDesign } from '../design/types';
import type { LayerInfo } from '../layout/types';
import { regionPaths, fromPath } from './clip-region';
import { narrowPlaces } from './narrow-features';
import type { MaskOptions } from './options';
import { averageWidth, signedArea } from './polygon-math';
import { regionBox } from '../design/region-box';
import type { ManufacturabilityReport, NarrowFeature, RemovedSliver, ReportWarning } from './report-types';
import { measureZonesAlongRays } from './zone-rays';

const LISTED = 200;

export interface DrawnLayer {
  info: LayerInfo;
  /** the polygons written to the mask */
  polygons: Float64Array[];
  /** pieces left out as slivers (see removeSlivers) */
  slivers: Float64Array[];
  /** whether a polygon may hold a feature narrower than the minimum (the others are proven wide enough) */
  mayBeNarrow: (polygon: Float64Array) => boolean;
  /** what the opening takes from pieces already opened alone by their tile (pieceLosses) */
  knownLosses: ReadonlyMap<Float64Array, Float64Array[][]>;
}

const fmt = (v: number) => (Math.abs(v) >= 100 ? v.toFixed(1) : v.toPrecision(3));

/**
 * Splits pieces into those kept and slivers: narrower on average (2·area/perimeter, grid units) than
 * `width`. A width of 0 keeps everything. Zones that are merely narrow are far wider than any sensible
 * sliver width, so they stay and the opening reports them.
 */
export function removeSlivers(polygons: Float64Array[], width: number): { kept: Float64Array[]; slivers: Float64Array[] } {
  if (!(width > 0)) return { kept: polygons, slivers: [] };
  const kept: Float64Array[] = [];
  const slivers: Float64Array[] = [];
  for (const p of polygons) (averageWidth(p) < width ? slivers : kept).push(p);
  return { kept, slivers };
}

/** Area centroid of a loop (grid units). */
function centroid(loop: Float64Array): { x: number; y: number } {
  const n = loop.length / 2;
  let a = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const cross = loop[2 * j] * loop[2 * i + 1] - loop[2 * i] * loop[2 * j + 1];
    a += cross;
    cx += (loop[2 * j] + loop[2 * i]) * cross;
    cy += (loop[2 * j + 1] + loop[2 * i + 1]) * cross;
  }
  return a === 0 ? { x: loop[0], y: loop[1] } : { x: cx / (3 * a), y: cy / (3 * a) };
}

export function buildReport(design: CompiledDesign, options: MaskOptions, layers: DrawnLayer[], centre: { x: number; y: number }): ManufacturabilityReport {
  const gridUm = options.databaseUnit / 1e-6;
  const scale = 1 / gridUm;
  const apertureArea = regionPaths(design.aperture, scale, options.chordTolerance).reduce((s, p) => s + signedArea(fromPath(p)), 0) * gridUm * gridUm;
  const box = regionBox(design.aperture);
  const reach = 2 * Math.hypot(box.x1 - box.x0, box.y1 - box.y0);
  const rays = measureZonesAlongRays(design, centre, reach);
  const warnings: ReportWarning[] = [];
  const narrowFeatures: NarrowFeature[] = [];
  let narrowFeatureCount = 0;
  const slivers: RemovedSliver[] = [];
  let sliverCount = 0;
  let sliverArea = 0;
  const summaries = layers.map((layer) => {
    let vertices = 0;
    let area = 0;
    for (const p of layer.polygons) {
      vertices += p.length / 2;
      area += signedArea(p);
    }
    let layerSliverArea = 0;
    let firstSliver: RemovedSliver | null = null;
    for (const p of layer.slivers) {
      const at = centroid(p);
      const sliver = { layer: layer.info.layer, datatype: layer.info.datatype, x_um: at.x * gridUm, y_um: at.y * gridUm, area_um2: Math.abs(signedArea(p)) * gridUm * gridUm, width_um: averageWidth(p) * gridUm };
      firstSliver ??= sliver;
      layerSliverArea += sliver.area_um2;
      if (slivers.length < LISTED) slivers.push(sliver);
    }
    sliverCount += layer.slivers.length;
    sliverArea += layerSliverArea;
    if (firstSliver) {
      const n = layer.slivers.length;
      warnings.push({
        kind: 'sliver',
        message:
          `${n} sliver${n === 1 ? ' was' : 's were'} removed from layer ${layer.info.layer}/${layer.info.datatype} (${fmt(layerSliverArea)} µm² in all): ${n === 1 ? 'it is' : 'they are'} narrower on average than the sliver width of ${fmt(options.minSliverWidth)} µm, which pattern generators drop or distort. ` +
          `Such pieces come from the geometry itself, e.g. where the aperture edge runs nearly along a zone boundary; set the sliver width to 0 to keep them. The first was near (${fmt(firstSliver.x_um)}, ${fmt(firstSliver.y_um)}) µm.`,
        x_um: firstSliver.x_um,
        y_um: firstSliver.y_um,
      });
    }
    let layerNarrow = 0;
    let first: NarrowFeature | null = null;
    for (const place of narrowPlaces(layer.polygons, layer.mayBeNarrow, options.minimumFeature * scale, options.chordTolerance * scale, layer.knownLosses)) {
      layerNarrow++;
      const feature = { layer: layer.info.layer, datatype: layer.info.datatype, x_um: place.x * gridUm, y_um: place.y * gridUm, area_um2: place.area * gridUm * gridUm };
      first ??= feature;
      if (narrowFeatures.length < LISTED) narrowFeatures.push(feature);
    }
    narrowFeatureCount += layerNarrow;
    if (first) {
      warnings.push({
        kind: 'narrow-feature',
        message:
          `${layerNarrow} place${layerNarrow === 1 ? '' : 's'} on layer ${layer.info.layer}/${layer.info.datatype} ${layerNarrow === 1 ? 'is' : 'are'} narrower than the process minimum of ${fmt(options.minimumFeature)} µm: ` +
          `shrinking every shape by half the minimum and growing it back loses them, so they may print thinner, break up or vanish. ` +
          `The first is near (${fmt(first.x_um)}, ${fmt(first.y_um)}) µm.`,
        x_um: first.x_um,
        y_um: first.y_um,
      });
    }
    return {
      layer: layer.info.layer,
      datatype: layer.info.datatype,
      name: layer.info.name,
      polygons: layer.polygons.length,
      vertices,
      drawnArea_um2: area * gridUm * gridUm,
      drawnFraction: apertureArea > 0 ? (area * gridUm * gridUm) / apertureArea : 0,
    };
  });
  if (rays.narrowestZone && rays.narrowestZone.width_um < options.minimumFeature) {
    warnings.push({
      kind: 'narrow-zone',
      message: `The narrowest zone is ${fmt(rays.narrowestZone.width_um)} µm wide near (${fmt(rays.narrowestZone.x_um)}, ${fmt(rays.narrowestZone.y_um)}) µm, below the process minimum of ${fmt(options.minimumFeature)} µm; a smaller aperture, a longer focal length or a finer process avoids it.`,
      x_um: rays.narrowestZone.x_um,
      y_um: rays.narrowestZone.y_um,
    });
  }
  if (rays.smallestGap && rays.smallestGap.width_um < options.minimumFeature) {
    warnings.push({
      kind: 'narrow-gap',
      message: `The smallest gap between zones is ${fmt(rays.smallestGap.width_um)} µm near (${fmt(rays.smallestGap.x_um)}, ${fmt(rays.smallestGap.y_um)}) µm, below the process minimum of ${fmt(options.minimumFeature)} µm; neighbouring zones may merge.`,
      x_um: rays.smallestGap.x_um,
      y_um: rays.smallestGap.y_um,
    });
  }
  const edge = regionPaths(design.aperture, scale, options.chordTolerance).flat();
  const numericalApertures = design.foci.map((f, i) => {
    let rho = 0;
    for (const p of edge) rho = Math.max(rho, Math.hypot(p.X * gridUm - f.x, p.Y * gridUm - f.y));
    return { focus: i, x_um: f.x, y_um: f.y, z_um: f.z, numericalAperture: rho / Math.hypot(rho, f.z) };
  });
  const q = design.quantization;
  const firstFraction = summaries[0]?.drawnFraction ?? 0;
  const openAreaFraction = q.kind === 'binary' && q.tone === 'negative' ? 1 - firstFraction : firstFraction;
  const all = layers.flatMap((l) => l.polygons);
  return {
    databaseUnit_m: options.databaseUnit,
    userUnit_m: options.userUnit,
    chordTolerance_um: options.chordTolerance,
    maxVertices: options.maxVertices,
    minimumFeature_um: options.minimumFeature,
    zoneCount: rays.zoneCount,
    outermostZone: rays.outermostZone,
    narrowestZone: rays.narrowestZone,
    smallestGap: rays.smallestGap,
    numericalApertures,
    apertureArea_um2: apertureArea,
    openAreaFraction,
    polygonCount: all.length,
    vertexCount: summaries.reduce((s, l) => s + l.vertices, 0),
    largestPolygonVertices: all.reduce((m, p) => Math.max(m, p.length / 2), 0),
    layers: summaries,
    narrowFeatureCount,
    narrowFeatures,
    sliverWidth_um: options.minSliverWidth,
    sliverCount,
    sliverArea_um2: sliverArea,
    slivers,
    warnings,
  };
}
