import type { LayoutLibrary, LayoutPlacement } from '../layout/types';
import { cellBoundingBox, isEmptyBox } from '../layout/bounding-box';
import { INK, OPEN, layerKey, layerStyles } from './layer-style';
import { scaleBar } from './scale-bar';

export interface SvgOptions {
  /** shown above the legend, e.g. the design name and revision */
  title?: string;
  /** drawing size (the larger side) over the smallest detail kept; default 20,000 */
  detail?: number;
  /** about how many vertices the preview keeps in all (each cell's own polygons counted once); default 400,000 */
  vertexBudget?: number;
}

/**
 * An SVG preview of a library, streamed as text chunks. The viewBox is in µm (y up, as on the mask);
 * every cell is a <symbol>-like group in <defs> drawn in DBU, placements are <use> elements,
 * so arrays stay small. One group per layer with its colour, then a legend and a scale bar.
 */
export function* svgChunks(library: LayoutLibrary, options: SvgOptions = {}): Generator<string> {
  const micrometresPerDbu = library.databaseUnit / 1e-6;
  let box = cellBoundingBox(library, library.topCell);
  if (isEmptyBox(box)) box = { x0: -1 / micrometresPerDbu, y0: -1 / micrometresPerDbu, x1: 1 / micrometresPerDbu, y1: 1 / micrometresPerDbu };
  const width = (box.x1 - box.x0) * micrometresPerDbu;
  const height = (box.y1 - box.y0) * micrometresPerDbu;
  const margin = 0.05 * Math.max(width, height);
  const font = 0.035 * Math.max(width, height);
  const styles = layerStyles(library.layers);
  const resolution = previewResolution(library, Math.max(box.x1 - box.x0, box.y1 - box.y0) / (options.detail ?? 20_000), options.vertexBudget ?? 400_000);
  const cellLayerId = cellLayerIds(library);
  const legendRows = library.layers.length + 2;
  const legendHeight = legendRows * font * 1.6 + margin;
  const left = box.x0 * micrometresPerDbu - margin;
  const top = -box.y1 * micrometresPerDbu - margin;
  const viewWidth = width + 2 * margin;
  const viewHeight = height + 2 * margin + legendHeight;

  yield `<?xml version="1.0" encoding="UTF-8"?>\n`;
  yield `<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" viewBox="${num(left)} ${num(top)} ${num(viewWidth)} ${num(viewHeight)}" width="${num(viewWidth)}um" height="${num(viewHeight)}um">\n`;
  yield `<title>${escapeXml(options.title ?? library.name)}</title>\n`;
  yield `<rect x="${num(left)}" y="${num(top)}" width="${num(viewWidth)}" height="${num(viewHeight)}" fill="#f7f7f2"/>\n`;
  yield `<rect x="${num(box.x0 * micrometresPerDbu)}" y="${num(-box.y1 * micrometresPerDbu)}" width="${num(width)}" height="${num(height)}" fill="${OPEN}"/>\n`;

  // Per cell and layer one group; the layer's colour sits on the outer layer group of each <use>.
  yield '<defs>\n';
  for (const cell of library.cells) {
    for (const shapes of cell.shapes) {
      yield `<g id="${cellLayerId(cell.name, shapes.layer, shapes.datatype)}">\n`;
      for (const polygon of shapes.polygons) yield `<path d="${pathData(polygon, resolution)}"/>\n`;
      for (const placement of cell.placements) yield useElement(placement, cellLayerId(placement.cell, shapes.layer, shapes.datatype));
      yield '</g>\n';
    }
    // layers a cell only inherits through its placements still need a group to refer to
    for (const layer of library.layers) {
      if (cell.shapes.some((s) => s.layer === layer.layer && s.datatype === layer.datatype)) continue;
      yield `<g id="${cellLayerId(cell.name, layer.layer, layer.datatype)}">\n`;
      for (const placement of cell.placements) yield useElement(placement, cellLayerId(placement.cell, layer.layer, layer.datatype));
      yield '</g>\n';
    }
  }
  yield '</defs>\n';

  yield `<g transform="scale(${num(micrometresPerDbu)},${num(-micrometresPerDbu)})">\n`;
  for (const layer of library.layers) {
    const style = styles.get(layerKey(layer.layer, layer.datatype));
    if (!style) continue;
    yield `<g id="layer-${layer.layer}-${layer.datatype}" data-name="${escapeXml(layer.name)}" fill="${style.fill}" fill-opacity="${style.opacity}">`;
    yield `<use xlink:href="#${cellLayerId(library.topCell, layer.layer, layer.datatype)}" href="#${cellLayerId(library.topCell, layer.layer, layer.datatype)}"/></g>\n`;
  }
  yield '</g>\n';

  // Legend and scale bar, below the drawing, in µm.
  const legendTop = box.y1 * -micrometresPerDbu + height + margin + font;
  const x = box.x0 * micrometresPerDbu;
  yield `<g font-family="'JetBrains Mono', monospace" font-size="${num(font)}" fill="${INK}">\n`;
  yield `<text x="${num(x)}" y="${num(legendTop)}">${escapeXml(options.title ?? library.name)}</text>\n`;
  for (const [index, layer] of library.layers.entries()) {
    const style = styles.get(layerKey(layer.layer, layer.datatype));
    const y = legendTop + (index + 1) * font * 1.6;
    yield `<rect x="${num(x)}" y="${num(y - font * 0.8)}" width="${num(font)}" height="${num(font)}" fill="${style?.fill}" fill-opacity="${style?.opacity}" stroke="${INK}" stroke-width="${num(font / 20)}"/>\n`;
    yield `<text x="${num(x + font * 1.5)}" y="${num(y)}">${escapeXml(`${layer.layer}/${layer.datatype} ${layer.name} (${layer.purpose})`)}</text>\n`;
  }
  const bar = scaleBar(width);
  const barY = legendTop + (library.layers.length + 1) * font * 1.6;
  yield `<rect x="${num(x)}" y="${num(barY - font * 0.5)}" width="${num(bar.length)}" height="${num(font * 0.3)}" fill="${INK}"/>\n`;
  yield `<text x="${num(x + bar.length + font * 0.5)}" y="${num(barY)}">${bar.label}</text>\n`;
  yield '</g>\n</svg>\n';
}

export function writeSvg(library: LayoutLibrary, options: SvgOptions = {}): string {
  return [...svgChunks(library, options)].join('');
}

function useElement(placement: LayoutPlacement, target: string): string {
  const columns = placement.columns ?? 1;
  const rows = placement.rows ?? 1;
  const rotation = placement.rotation ?? 0;
  // SVG applies the list right to left: reflect first, then rotate, then move
  const transform = `${rotation ? ` rotate(${rotation})` : ''}${placement.mirrorX ? ' scale(1,-1)' : ''}`;
  let out = '';
  for (let i = 0; i < columns; i++) {
    for (let j = 0; j < rows; j++) {
      const dx = placement.x + i * (placement.columnStep?.x ?? 0) + j * (placement.rowStep?.x ?? 0);
      const dy = placement.y + i * (placement.columnStep?.y ?? 0) + j * (placement.rowStep?.y ?? 0);
      out += `<use href="#${target}" xlink:href="#${target}" transform="translate(${dx},${dy})${transform}"/>\n`;
    }
  }
  return out;
}

/**
 * Path data in DBU. A vertex closer than the resolution (in both x and y) to the last one kept is dropped unless
 * the outline turns there by more than 20° (corners such as the ends of fractured ring pieces stay): a preview is
 * looked at, not fabricated, and this keeps very large designs small.
 */
function pathData(polygon: ArrayLike<number>, coarsest: number): string {
  const resolution = Math.min(coarsest, polygonSize(polygon) / 8);
  const n = polygon.length / 2;
  let d = `M${polygon[0]} ${polygon[1]}`;
  let lastX = polygon[0];
  let lastY = polygon[1];
  for (let i = 1; i < n; i++) {
    const x = polygon[2 * i];
    const y = polygon[2 * i + 1];
    const next = ((i + 1) % n) * 2;
    const near = Math.abs(x - lastX) < resolution && Math.abs(y - lastY) < resolution;
    if (near && !sharpTurn(x - lastX, y - lastY, polygon[next] - x, polygon[next + 1] - y)) continue;
    lastX = x;
    lastY = y;
    d += `L${x} ${y}`;
  }
  return `${d}Z`;
}

const COS_20_DEGREES = Math.cos((20 * Math.PI) / 180);

function sharpTurn(ax: number, ay: number, bx: number, by: number): boolean {
  const lengths = Math.hypot(ax, ay) * Math.hypot(bx, by);
  return lengths > 0 && ax * bx + ay * by < COS_20_DEGREES * lengths;
}

/**
 * The vertex spacing (DBU) the preview keeps: the detail limit, or coarser when the outlines are so long that
 * at that spacing they would exceed the budget (outline length / spacing ≈ vertices kept).
 */
function previewResolution(library: LayoutLibrary, detail: number, budget: number): number {
  let perimeter = 0;
  for (const cell of library.cells) {
    for (const shapes of cell.shapes) {
      for (const polygon of shapes.polygons) {
        for (let i = 2; i < polygon.length; i += 2) perimeter += Math.abs(polygon[i] - polygon[i - 2]) + Math.abs(polygon[i + 1] - polygon[i - 1]);
      }
    }
  }
  return Math.max(detail, perimeter / budget);
}

/** The larger side of a polygon's bounding box; a polygon keeps its shape by never dropping vertices at 1/8 of it. */
function polygonSize(polygon: ArrayLike<number>): number {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (let i = 0; i < polygon.length; i += 2) {
    x0 = Math.min(x0, polygon[i]);
    x1 = Math.max(x1, polygon[i]);
    y0 = Math.min(y0, polygon[i + 1]);
    y1 = Math.max(y1, polygon[i + 1]);
  }
  return Math.max(x1 - x0, y1 - y0);
}

function cellLayerIds(library: LayoutLibrary): (cell: string, layer: number, datatype: number) => string {
  const index = new Map(library.cells.map((c, i) => [c.name, i]));
  return (cell, layer, datatype) => `c${index.get(cell)}-${layer}-${datatype}`;
}

function num(value: number): string {
  return String(Number(value.toPrecision(8)));
}

function escapeXml(text: string): string {
  return text.replace(/[<>&"]/g, (c) => ({ '<': '&lt;', '>': '&gt;', '&': '&amp;', '"': '&quot;' })[c] as string);
}
