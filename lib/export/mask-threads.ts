/**
 * The mask geometry on worker threads: the tile plans go to N threads through one queue (biggest
 * first, each thread takes the next plan when it is done), the polygons come back as moved buffers,
 * and the results are joined in plan order, so the mask is the same as buildMask's to the last
 * vertex. Rotationally symmetric designs take the geometry's exact radial path instead, inline.
 */
import path from 'node:path';
import { resourceLimits as ownLimits, type Worker } from 'node:worker_threads';
import type { CompiledDesign } from '../design/types';
import {
  assembleMask,
  buildMaskTile,
  GeometryError,
  MaskOptionsError,
  planMaskTiles,
  QuantizationError,
  exactMaskTiles,
  RegionError,
  validateDesign,
  type MaskOptions,
  type MaskResult,
  type MaskTilePlan,
  type MaskTileResult,
} from '../geometry';
import { loopBounds } from '../geometry/polygon-math';
import type { PhaseMap } from '../phasemap/types';
import { startTypeScriptWorker } from '../threads/typescript-worker';
import { ExportError } from './errors';
import type { TileRequest, TileThreadMessage, TileThreadSetup } from './mask-tile-thread';

export interface MaskThreadsInput {
  /** the script the design was compiled from: a design holds functions, so each thread compiles it again */
  source: string;
  /** every phase map the script reads, by name */
  phaseMaps: ReadonlyMap<string, PhaseMap>;
  /** the compiled design (its quantization may differ from the script's, e.g. a matrix column's duty) */
  design: CompiledDesign;
  options: MaskOptions;
  /** worker threads to use; 1 builds every tile on the calling thread */
  threads: number;
  /** called after each finished tile */
  onTile?: (done: number, total: number) => void;
}

const THREAD_ENTRY = path.join(__dirname, 'mask-tile-thread.ts');

/**
 * Heap of one tile thread, MB. The polygons live in typed arrays outside the heap; the heap holds
 * the tracer's and the clipper's objects for one tile. Never more than the calling thread's own limit.
 */
const TILE_HEAP_MB = Math.min(2048, ownLimits.maxOldGenerationSizeMb || Infinity);

/** By the `name` each class gives its errors, which is what crosses the thread boundary. */
const GEOMETRY_ERRORS = new Map<string, new (message: string) => Error>([
  ['GeometryError', GeometryError],
  ['MaskOptionsError', MaskOptionsError],
  ['QuantizationError', QuantizationError],
  ['RegionError', RegionError],
]);

/** The same mask as buildMask, with the traced tiles spread over `threads` worker threads. */
export async function buildMaskOnThreads(input: MaskThreadsInput): Promise<MaskResult> {
  const { design, options } = input;
  validateDesign(design);
  const exact = exactMaskTiles(design, options);
  if (exact) return assembleMask(design, options, exact);
  const plans = planMaskTiles(design, options.chordTolerance);
  const tiles =
    input.threads <= 1 || plans.length <= 1
      ? plans.map((plan, i) => {
          const tile = buildMaskTile(design, options, plan);
          input.onTile?.(i + 1, plans.length);
          return tile;
        })
      : await tilesOnThreads(input, plans);
  return assembleMask(design, options, tiles);
}

/**
 * Work of a tile, roughly: its boundary length, ∫ 2·F dA with F the field's frequency bound over an
 * 8 × 8 grid of cells (cells whose centre lies in the convex domain). Only orders the queue.
 */
function estimatedWork(design: CompiledDesign, plan: MaskTilePlan, chordTolerance: number): number {
  const d = plan.domain;
  const { x0, y0, x1, y1 } = loopBounds(d);
  const field = design.pieces[plan.piece].field;
  const cells = 8;
  const w = (x1 - x0) / cells;
  const h = (y1 - y0) / cells;
  let work = 0;
  for (let i = 0; i < cells; i++) {
    for (let j = 0; j < cells; j++) {
      const cx = x0 + (i + 0.5) * w;
      const cy = y0 + (j + 0.5) * h;
      if (!insideConvex(d, cx, cy)) continue;
      // a singular bound counts as one boundary per chord tolerance
      const f = Math.min(field.maxSpatialFrequency(cx - 0.5 * w, cy - 0.5 * h, cx + 0.5 * w, cy + 0.5 * h), 1 / chordTolerance);
      work += 2 * f * w * h;
    }
  }
  return work;
}

/** Inside or on a counter-clockwise convex polygon (flat x,y pairs). */
function insideConvex(polygon: number[], x: number, y: number): boolean {
  const n = polygon.length / 2;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const ax = polygon[2 * j];
    const ay = polygon[2 * j + 1];
    if ((polygon[2 * i] - ax) * (y - ay) - (polygon[2 * i + 1] - ay) * (x - ax) < 0) return false;
  }
  return true;
}

/** A phase-map lookup for the compiler that keeps every map it handed out, for the tile threads. */
export function phaseMapRecorder(lookup: ((name: string) => PhaseMap | undefined) | undefined): {
  lookup: (name: string) => PhaseMap | undefined;
  used: Map<string, PhaseMap>;
} {
  const used = new Map<string, PhaseMap>();
  return {
    used,
    lookup: (name) => {
      const map = lookup?.(name);
      if (map) used.set(name, map);
      return map;
    },
  };
}

/** Phase maps on shared memory: one copy of the samples serves every thread. */
function sharedPhaseMaps(maps: ReadonlyMap<string, PhaseMap>): Map<string, PhaseMap> {
  const shared = new Map<string, PhaseMap>();
  for (const [name, map] of maps) {
    const values = new Float64Array(new SharedArrayBuffer(map.values.byteLength));
    values.set(map.values);
    shared.set(name, { ...map, values });
  }
  return shared;
}

/** The error a thread reported, as the class the single-thread path throws. */
function threadError(name: string, message: string): Error {
  const Known = GEOMETRY_ERRORS.get(name);
  return Known ? new Known(message) : new Error(`a mask tile thread failed: ${message}`);
}

function tilesOnThreads(input: MaskThreadsInput, plans: MaskTilePlan[]): Promise<MaskTileResult[]> {
  const { design, options } = input;
  const work = plans.map((plan) => estimatedWork(design, plan, options.chordTolerance));
  const queue = plans.map((_, i) => i).sort((a, b) => work[b] - work[a] || a - b);
  const setup: TileThreadSetup = {
    source: input.source,
    phaseMaps: sharedPhaseMaps(input.phaseMaps),
    quantization: design.quantization,
    pieceCount: design.pieces.length,
    options,
  };
  const results: MaskTileResult[] = new Array(plans.length);
  const workers: Worker[] = [];
  return new Promise<MaskTileResult[]>((resolve, reject) => {
    let done = 0;
    let settled = false;
    const finish = (outcome: () => void) => {
      if (settled) return;
      settled = true;
      for (const worker of workers) void worker.terminate();
      outcome();
    };
    const sendNext = (worker: Worker) => {
      const index = queue.shift();
      if (index !== undefined) worker.postMessage({ index, plan: plans[index] } satisfies TileRequest);
    };
    const start = () => {
      const worker = startTypeScriptWorker(THREAD_ENTRY, { workerData: setup, resourceLimits: { maxOldGenerationSizeMb: TILE_HEAP_MB } });
      workers.push(worker);
      worker.on('message', (message: TileThreadMessage) => {
        if (message.kind === 'error') {
          finish(() => reject(threadError(message.name, message.message)));
          return;
        }
        results[message.index] = message.result;
        done++;
        try {
          input.onTile?.(done, plans.length);
        } catch (error) {
          // a listener's failure would otherwise escape the event handler and leave the threads running
          finish(() => reject(error));
          return;
        }
        if (done === plans.length) finish(() => resolve(results));
        else sendNext(worker);
      });
      worker.on('error', (error) => {
        const outOfMemory = (error as { code?: string }).code === 'ERR_WORKER_OUT_OF_MEMORY';
        finish(() =>
          reject(
            outOfMemory
              ? new ExportError('budget', `a mask tile needed more than ${TILE_HEAP_MB} MB of memory on its thread; use a coarser chord tolerance or a smaller aperture`)
              : error,
          ),
        );
      });
      worker.on('exit', (code) => finish(() => reject(new Error(`a mask tile thread exited (code ${code}) before the mask was done`))));
      sendNext(worker);
    };
    try {
      for (let t = 0; t < Math.min(input.threads, plans.length); t++) start();
    } catch (error) {
      // a thread that cannot start must not leave the others running
      finish(() => reject(error));
    }
  });
}
