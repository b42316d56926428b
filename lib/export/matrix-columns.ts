import type { MatrixColumnManifest } from '../bundle/manifest';
import type { CompiledDesign } from '../design/types';
import type { ManufacturabilityReport } from '../geometry';
import { regionPaths } from '../geometry/clip-region';
import { signedArea } from '../geometry/polygon-math';
import { sizeBias } from '../geometry/size-bias';
import type { LayoutLibrary } from '../layout/types';
import { ExportError } from './errors';
import type { ExposureMatrixRequest, ResolvedExportOptions } from './export-options';

type ColumnRequest = ExposureMatrixRequest['columns'][number];

export const BIAS_CONVENTION =
  'bias_um is the change in width of every drawn feature (the usual meaning of a size bias; common practice, no source): ' +
  'each edge of every shape on the zone or level layers moves outward by bias/2, inward when negative, so drawn zones widen by bias ' +
  'and the gaps between them narrow by bias. Grown shapes stay clipped to the aperture; shapes that touch merge.';

/** "+0.10", "-0.004", "0.00": signed, at least two decimals, as many as the value needs. */
export function formatBias(bias: number): string {
  const magnitude = Math.abs(bias);
  let decimals = 2;
  while (decimals < 6 && Number(magnitude.toFixed(decimals)) !== magnitude) decimals++;
  return `${bias > 0 ? '+' : bias < 0 ? '-' : ''}${magnitude.toFixed(decimals)}`;
}

/** A column's caption when none is given: its duty and bias, e.g. "duty 0.4 bias +0.10". */
export function defaultCaption(column: ColumnRequest, index: number): string {
  const parts = [column.duty !== undefined ? `duty ${column.duty}` : '', column.bias !== undefined ? `bias ${formatBias(column.bias)}` : ''].filter(Boolean);
  return parts.length > 0 ? parts.join(' ') : `C${index + 1}`;
}

const fmt = (v: number) => (Math.abs(v) >= 100 ? v.toFixed(1) : v.toPrecision(3));

/**
 * One matrix column as drawn: its mask with the column's size bias applied to the zone or level
 * layers (labels and the aperture marker untouched), and its manifest entry measured on that geometry.
 * Refuses a bias that erases every zone or merges them all into one shape.
 */
export function matrixColumn(
  mask: { library: LayoutLibrary; report: ManufacturabilityReport },
  request: ColumnRequest,
  caption: string,
  design: CompiledDesign,
  settings: ResolvedExportOptions,
): { library: LayoutLibrary; entry: MatrixColumnManifest } {
  const { report } = mask;
  const bias = request.bias ?? 0;
  const grid = settings.databaseUnit;
  const drawn = new Set(mask.library.layers.filter((l) => l.purpose === 'zones' || l.purpose === 'level').map((l) => `${l.layer}/${l.datatype}`));
  const top = mask.library.cells.find((c) => c.name === mask.library.topCell)!;
  const warnings: string[] = [];
  let zonesLost = 0;
  let zonesMerged = 0;
  let library = mask.library;
  if (bias !== 0) {
    const clip = regionPaths(design.aperture, 1 / grid, settings.chordTolerance);
    const narrowest = report.narrowestZone ? `; the narrowest zone is ${fmt(report.narrowestZone.width_um)} µm wide` : '';
    const smallestGap = report.smallestGap ? `; the smallest gap between zones is ${fmt(report.smallestGap.width_um)} µm` : '';
    const shapes = top.shapes.map((shape) => {
      const key = `${shape.layer}/${shape.datatype}`;
      if (!drawn.has(key)) return shape;
      const result = sizeBias(shape.polygons, 2 * Math.round(bias / 2 / grid), clip, settings.maxVertices);
      if (result.shapesBefore > 0 && result.polygons.length === 0) {
        throw new ExportError('options', `matrix column "${caption}": a bias of ${formatBias(bias)} µm erases every zone on layer ${key} (each zone narrows by ${fmt(-bias)} µm${narrowest}); use a smaller negative bias`);
      }
      if (result.shapesBefore > 1 && result.shapesMerged === result.shapesBefore - 1) {
        throw new ExportError('options', `matrix column "${caption}": a bias of ${formatBias(bias)} µm merges all ${result.shapesBefore} zones on layer ${key} into one shape (each gap narrows by ${fmt(bias)} µm${smallestGap}); use a smaller bias`);
      }
      zonesLost += result.shapesLost;
      if (result.shapesLost > 0) warnings.push(`a bias of ${formatBias(bias)} µm erases ${result.shapesLost} of ${result.shapesBefore} zones on layer ${key}${narrowest}`);
      zonesMerged += result.shapesMerged;
      if (result.shapesMerged > 0) warnings.push(`a bias of ${formatBias(bias)} µm joins ${result.shapesMerged} of ${result.shapesBefore} zones on layer ${key} to a neighbour${smallestGap}`);
      return { ...shape, polygons: result.polygons.map((p) => Int32Array.from(p)) };
    });
    library = { ...mask.library, cells: mask.library.cells.map((c) => (c === top ? { ...c, shapes } : c)) };
  }

  const cell = library.cells.find((c) => c.name === library.topCell)!;
  const layers = cell.shapes
    .filter((s) => drawn.has(`${s.layer}/${s.datatype}`))
    .map((s) => ({
      layer: s.layer,
      datatype: s.datatype,
      polygons: s.polygons.length,
      vertices: s.polygons.reduce((n, p) => n + p.length / 2, 0),
      drawnArea_um2: s.polygons.reduce((a, p) => a + signedArea(p), 0) * grid * grid,
    }));
  const q = design.quantization;
  const drawnFraction = report.apertureArea_um2 > 0 && layers.length > 0 ? layers[0].drawnArea_um2 / report.apertureArea_um2 : 0;
  const shifted = (width: number | undefined, by: number) => (width === undefined || width + by <= 0 ? null : width + by);
  return {
    library,
    entry: {
      caption,
      duty: request.duty ?? null,
      bias_um: request.bias ?? null,
      layers,
      openAreaFraction: q.kind === 'binary' && q.tone === 'negative' ? 1 - drawnFraction : drawnFraction,
      zonesLost,
      zonesMerged,
      narrowestZone_um: shifted(report.narrowestZone?.width_um, bias),
      smallestGap_um: shifted(report.smallestGap?.width_um, -bias),
      warnings,
    },
  };
}

/** A line per column for the CLI summary and README.txt. */
export function matrixColumnLines(entries: readonly MatrixColumnManifest[]): string[] {
  return entries.flatMap((e) => [
    `column "${e.caption}": drawn ${e.layers.map((l) => `${l.drawnArea_um2.toFixed(1)} µm² on ${l.layer}/${l.datatype}`).join(', ')}; open area ${(e.openAreaFraction * 100).toFixed(2)} %` +
      (e.bias_um ? `; narrowest zone ≈ ${e.narrowestZone_um === null ? 'none' : `${e.narrowestZone_um.toFixed(3)} µm`}, smallest gap ≈ ${e.smallestGap_um === null ? 'none' : `${e.smallestGap_um.toFixed(3)} µm`}` : ''),
    ...e.warnings.map((w) => `warning: column "${e.caption}": ${w}`),
  ]);
}
