'use client';

import type { ReactNode } from 'react';
import type { CanvasViewport } from './use-canvas-viewport';
import { scaleBar, ZOOM_STEP } from './viewport';

/** The small square buttons of a canvas toolbar. */
export const TOOL_BUTTON =
  'rounded border border-hairline bg-paper px-2 py-1 text-ink hover:bg-open disabled:opacity-40 focus:outline-none focus-visible:ring-2 focus-visible:ring-accent';

const READOUT = 'pointer-events-none absolute bottom-2 rounded bg-paper/90 px-2 py-1 font-mono text-xs text-ink';

/**
 * The framed canvas of a `useCanvasViewport`, with the scale bar (bottom left) and the cursor's
 * mask-plane position (bottom right); `children` are further overlays.
 */
export function ViewportStage({
  viewport,
  label,
  cursor = 'grab',
  children,
}: {
  viewport: CanvasViewport;
  /** the canvas's accessible name, saying what it shows and how to move it */
  label: string;
  cursor?: 'grab' | 'crosshair';
  children?: ReactNode;
}) {
  const { wrapRef, canvasRef, width, height, view, handlers } = viewport;
  const bar = view ? scaleBar(view.pxPerUm) : null;
  const at = viewport.cursor;
  return (
    <div ref={wrapRef} className="relative w-full overflow-hidden rounded border border-hairline" style={{ height }}>
      <canvas
        ref={canvasRef}
        tabIndex={0}
        role="img"
        aria-label={label}
        className="block focus:outline-none focus-visible:ring-2 focus-visible:ring-accent"
        style={{ width, height, cursor, touchAction: 'none' }}
        {...handlers}
      />
      {children}
      {bar && (
        <div className={`${READOUT} left-2`}>
          <div style={{ width: bar.lengthPx }} className="h-1 border-x border-b border-ink" />
          <span data-testid="scale-bar">{bar.label}</span>
        </div>
      )}
      <div className={`${READOUT} right-2`} data-testid="cursor-position">
        {at ? `x ${at[0].toFixed(3)} µm  y ${at[1].toFixed(3)} µm` : 'x — µm  y — µm'}
      </div>
    </div>
  );
}

/** Zoom in / out about the centre of the view. */
export function ZoomButtons({ viewport }: { viewport: CanvasViewport }) {
  return (
    <>
      <button type="button" className={TOOL_BUTTON} aria-label="Zoom in" onClick={() => viewport.zoomAtCentre(ZOOM_STEP)} disabled={!viewport.view}>
        +
      </button>
      <button type="button" className={TOOL_BUTTON} aria-label="Zoom out" onClick={() => viewport.zoomAtCentre(1 / ZOOM_STEP)} disabled={!viewport.view}>
        −
      </button>
    </>
  );
}

/** One legend entry: a colour square and what it stands for. */
export function Swatch({ colour, label }: { colour: string; label: string }) {
  return (
    <span className="flex items-center gap-1">
      <span className="inline-block h-3 w-3 rounded-sm border border-hairline" style={{ background: colour }} />
      {label}
    </span>
  );
}
