'use client';

import { useEffect, useRef, useState } from 'react';
import type { LayoutLibrary } from '@/lib/layout/types';
import type { PhaseMapRecord } from '@/lib/jobs/export-job';
import type { MaskFigures, PreviewRequest, PreviewResult } from './preview-types';

const DEBOUNCE_MS = 500;
/** A preview still running after this is stopped; the saved export has its own, larger budget. */
const PREVIEW_BUDGET_MS = 30_000;
/** The preview draws at least this coarse (µm): fine enough to see every zone, quick to compute. */
const PREVIEW_MIN_CHORD = 0.05;

export interface PreviewState {
  /** the last mask drawn; kept on screen while a newer one is computed */
  library: LayoutLibrary | null;
  figures: MaskFigures | null;
  chordTolerance: number | null;
  elapsedMs: number | null;
  /** why the latest script has no mask (it does not compile, geometry refused, too slow) */
  message: string | null;
  busy: boolean;
}

export interface PreviewInput {
  script: string;
  databaseUnit: number;
  minimumFeature: number;
  chordTolerance: number;
}

/**
 * The live mask preview, computed in a web worker a moment after typing stops. A newer script
 * stops the worker if it is still busy with an older one, so only the latest text is drawn.
 */
export function usePreview(input: PreviewInput, phaseMaps: PhaseMapRecord[]): PreviewState {
  const [state, setState] = useState<PreviewState>({ library: null, figures: null, chordTolerance: null, elapsedMs: null, message: null, busy: true });
  const worker = useRef<Worker | null>(null);
  const pending = useRef<number | null>(null);
  const counter = useRef(0);

  useEffect(() => () => worker.current?.terminate(), []);

  const { script, databaseUnit, minimumFeature, chordTolerance } = input;
  useEffect(() => {
    let budget: ReturnType<typeof setTimeout> | null = null;
    const start = setTimeout(() => {
      // A worker still drawing an older script is stopped: its answer would be thrown away anyway.
      if (pending.current !== null && worker.current) {
        worker.current.terminate();
        worker.current = null;
      }
      if (!worker.current) {
        worker.current = new Worker(new URL('./preview.worker.ts', import.meta.url), { type: 'module' });
      }
      const w = worker.current;
      const id = ++counter.current;
      pending.current = id;
      setState((s) => ({ ...s, busy: true }));
      w.onmessage = (event: MessageEvent<PreviewResult>) => {
        if (event.data.id !== id) return;
        pending.current = null;
        if (budget) clearTimeout(budget);
        const r = event.data;
        setState((s) =>
          r.ok
            ? { library: r.library, figures: r.figures, chordTolerance: r.chordTolerance, elapsedMs: r.elapsedMs, message: null, busy: false }
            : { ...s, message: r.message, busy: false },
        );
      };
      w.onerror = (event) => {
        pending.current = null;
        setState((s) => ({ ...s, message: `The preview stopped: ${event.message || 'the worker failed'}.`, busy: false }));
        worker.current = null;
      };
      const request: PreviewRequest = { id, script, databaseUnit, minimumFeature, chordTolerance: Math.max(chordTolerance, PREVIEW_MIN_CHORD), phaseMaps };
      w.postMessage(request);
      budget = setTimeout(() => {
        if (pending.current !== id) return;
        w.terminate();
        if (worker.current === w) worker.current = null;
        pending.current = null;
        setState((s) => ({
          ...s,
          busy: false,
          message: `The preview took longer than ${PREVIEW_BUDGET_MS / 1000} s and was stopped. Saving a revision still exports the full mask (within its own budget).`,
        }));
      }, PREVIEW_BUDGET_MS);
    }, DEBOUNCE_MS);
    return () => {
      clearTimeout(start);
      if (budget) clearTimeout(budget);
    };
  }, [script, databaseUnit, minimumFeature, chordTolerance, phaseMaps]);

  return state;
}
