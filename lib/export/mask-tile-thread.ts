/**
 * Body of a mask tile thread (started by mask-threads.ts): compiles the script once, then builds each
 * tile plan it is sent and posts the polygons back, moving their buffers instead of copying them.
 */
import { parentPort, workerData } from 'node:worker_threads';
import type { CompiledDesign } from '../design/types';
import { buildMaskTile, type MaskOptions, type MaskTilePlan, type MaskTileResult } from '../geometry';
import { compileScript } from '../lang';
import type { PhaseMap } from '../phasemap/types';
import { formatDiagnostics } from './errors';

export interface TileThreadSetup {
  source: string;
  phaseMaps: Map<string, PhaseMap>;
  /** the caller's quantization (a matrix column may override the script's duty cycle) */
  quantization: CompiledDesign['quantization'];
  pieceCount: number;
  options: MaskOptions;
}

export interface TileRequest {
  index: number;
  plan: MaskTilePlan;
}

export type TileThreadMessage =
  | { kind: 'tile'; index: number; result: MaskTileResult }
  | { kind: 'error'; name: string; message: string };

function compileDesign(setup: TileThreadSetup): CompiledDesign {
  const compiled = compileScript(setup.source, { phaseMaps: (name) => setup.phaseMaps.get(name) });
  if (!compiled.ok) throw new Error(`the script does not compile in the tile thread:\n${formatDiagnostics(compiled.diagnostics)}`);
  if (compiled.design.pieces.length !== setup.pieceCount) {
    throw new Error(`the tile thread compiled ${compiled.design.pieces.length} profile parts where the caller has ${setup.pieceCount}; the design was not compiled from this script`);
  }
  return { ...compiled.design, quantization: setup.quantization };
}

/** Every distinct buffer of a tile, once (clipped and opened pieces are also in their layer). */
function buffersOf(result: MaskTileResult): ArrayBuffer[] {
  const buffers = new Set<ArrayBuffer>();
  for (const loops of result.layers) for (const loop of loops) buffers.add(loop.buffer as ArrayBuffer);
  for (const losses of result.opened) for (const shapes of losses?.values() ?? []) for (const loops of shapes) for (const loop of loops) buffers.add(loop.buffer as ArrayBuffer);
  return [...buffers];
}

function main(): void {
  const port = parentPort!;
  const setup = workerData as TileThreadSetup;
  const fail = (error: unknown) =>
    port.postMessage({ kind: 'error', name: error instanceof Error ? error.name : 'Error', message: error instanceof Error ? error.message : String(error) } satisfies TileThreadMessage);
  let design: CompiledDesign;
  try {
    design = compileDesign(setup);
  } catch (error) {
    fail(error);
    return;
  }
  port.on('message', ({ index, plan }: TileRequest) => {
    try {
      const result = buildMaskTile(design, setup.options, plan);
      port.postMessage({ kind: 'tile', index, result } satisfies TileThreadMessage, buffersOf(result));
    } catch (error) {
      fail(error);
    }
  });
}

if (parentPort) main();
