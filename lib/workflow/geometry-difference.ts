/**
 * The geometry difference between two revisions' masks, per layer: areas added and removed (µm²)
 * from the geometry engine's XOR (run tile by tile, see tiled-xor.ts), and the changed regions as µm polygons for the overlay, cut to
 * a vertex budget so a change touching every zone still draws quickly (the areas stay complete).
 */
import type { LayoutLibrary } from '../layout/types';
import { flatLibrary } from './flat-library';
import { tiledXor } from './tiled-xor';

export interface LayerDifference {
  layer: number;
  datatype: number;
  name: string;
  /** µm², present in B and not in A */
  addedArea: number;
  /** µm², present in A and not in B */
  removedArea: number;
  /** µm, flat x,y pairs */
  added: number[][];
  removed: number[][];
  addedPolygons: number;
  removedPolygons: number;
}

export interface GeometryDifference {
  layers: LayerDifference[];
  /** µm box holding both masks, for framing the overlay */
  bounds: { x0: number; y0: number; x1: number; y1: number } | null;
  /** vertices sent for drawing */
  shownVertices: number;
  /** true when the vertex budget left some changed polygons out of the overlay (every k-th is drawn) */
  truncated: boolean;
}

export const OVERLAY_VERTEX_BUDGET = 200_000;

export interface DifferenceOptions {
  /** "layer/datatype" → name, e.g. from the bundles' manifests (a GDSII file carries no layer names) */
  layerNames?: ReadonlyMap<string, string>;
  vertexBudget?: number;
}

function layerName(names: ReadonlyMap<string, string> | undefined, layer: number, datatype: number): string {
  const key = `${layer}/${datatype}`;
  const name = names?.get(key);
  return name ? `${name} (${key})` : key;
}

/** Layer names from a bundle manifest's layer map, when it has one. */
export function manifestLayerNames(...manifests: (Record<string, unknown> | null)[]): Map<string, string> {
  const names = new Map<string, string>();
  for (const manifest of manifests) {
    const layers = manifest?.layers;
    if (!Array.isArray(layers)) continue;
    for (const l of layers as { layer?: unknown; datatype?: unknown; name?: unknown }[]) {
      if (typeof l.layer === 'number' && typeof l.datatype === 'number' && typeof l.name === 'string') names.set(`${l.layer}/${l.datatype}`, l.name);
    }
  }
  return names;
}

function libraryBounds(libs: LayoutLibrary[]): GeometryDifference['bounds'] {
  let x0 = Infinity;
  let y0 = Infinity;
  let x1 = -Infinity;
  let y1 = -Infinity;
  for (const lib of libs) {
    const um = lib.databaseUnit / 1e-6;
    for (const cell of lib.cells) {
      for (const shapes of cell.shapes) {
        for (const p of shapes.polygons) {
          for (let i = 0; i < p.length; i += 2) {
            x0 = Math.min(x0, p[i] * um);
            x1 = Math.max(x1, p[i] * um);
            y0 = Math.min(y0, p[i + 1] * um);
            y1 = Math.max(y1, p[i + 1] * um);
          }
        }
      }
    }
  }
  return Number.isFinite(x0) ? { x0, y0, x1, y1 } : null;
}

/** A = before, B = after; placements are expanded first so arrayed cells are compared too. */
export function geometryDifference(before: LayoutLibrary, after: LayoutLibrary, options: DifferenceOptions = {}): GeometryDifference {
  const vertexBudget = options.vertexBudget ?? OVERLAY_VERTEX_BUDGET;
  const a = flatLibrary(before);
  const b = flatLibrary(after);
  // xorLayers answers on A's grid when the grids differ
  const um = a.databaseUnit / 1e-6;
  const xor = tiledXor(a, b);
  const total = xor.reduce((sum, l) => [...l.added, ...l.removed].reduce((t, p) => t + p.length / 2, sum), 0);
  // Over budget, every k-th changed polygon is drawn, so the overlay still covers the whole mask evenly.
  const stride = Math.max(1, Math.ceil(total / vertexBudget));
  let shown = 0;
  let index = 0;
  const toUm = (polygons: Int32Array[]): number[][] =>
    polygons
      .filter(() => index++ % stride === 0)
      .map((p) => {
        shown += p.length / 2;
        return Array.from(p, (v) => v * um);
      });
  const layers = xor.map((l) => ({
    layer: l.layer,
    datatype: l.datatype,
    name: layerName(options.layerNames, l.layer, l.datatype),
    addedArea: l.addedArea,
    removedArea: l.removedArea,
    addedPolygons: l.added.length,
    removedPolygons: l.removed.length,
    added: toUm(l.added),
    removed: toUm(l.removed),
  }));
  return { layers, bounds: libraryBounds([a, b]), shownVertices: shown, truncated: stride > 1 };
}
