/// <reference lib="webworker" />
// Draws the live preview off the page's thread: compile, then the mask geometry at a coarse tolerance.
import { buildMask } from '@/lib/geometry';
import { maskFigures } from '@/lib/jobs/mask-figures';
import { phaseMapLookup } from '@/lib/jobs/phase-maps';
import { compileScript } from '@/lib/lang';
import type { PreviewRequest, PreviewResult } from './preview-types';

function transferables(result: PreviewResult): Transferable[] {
  if (!result.ok) return [];
  return result.library.cells.flatMap((c) => c.shapes.flatMap((s) => s.polygons.map((p) => p.buffer as ArrayBuffer)));
}

self.onmessage = (event: MessageEvent<PreviewRequest>) => {
  const request = event.data;
  const started = performance.now();
  let result: PreviewResult;
  const compiled = compileScript(request.script, { phaseMaps: phaseMapLookup(request.phaseMaps) });
  if (!compiled.ok) {
    const first = compiled.diagnostics.find((d) => d.severity === 'error');
    result = { id: request.id, ok: false, message: `The mask is drawn once the script compiles${first ? ` (line ${first.start.line}: ${first.message})` : ''}.` };
  } else {
    try {
      const { library, report } = buildMask(compiled.design, {
        databaseUnit: request.databaseUnit * 1e-6,
        userUnit: 1e-6,
        chordTolerance: request.chordTolerance,
        minimumFeature: request.minimumFeature,
        name: 'PREVIEW',
      });
      result = { id: request.id, ok: true, library, figures: maskFigures(report), chordTolerance: request.chordTolerance, elapsedMs: Math.round(performance.now() - started) };
    } catch (error) {
      result = { id: request.id, ok: false, message: `The mask could not be drawn: ${error instanceof Error ? error.message : String(error)}` };
    }
  }
  self.postMessage(result, transferables(result));
};
