'use client';

import { useCallback, useMemo } from 'react';
import { ADDED, REMOVED } from '@/components/mask-view/layer-colours';
import { polygonPath } from '@/components/mask-view/polygon-path';
import { useCanvasViewport, type CanvasFrame } from '@/components/mask-view/use-canvas-viewport';
import { Swatch, TOOL_BUTTON, ViewportStage, ZoomButtons } from '@/components/mask-view/ViewportStage';
import type { GeometryDifference } from '@/lib/workflow/geometry-difference';

/**
 * The changed regions of two masks over the extent of both: added teal, removed amber.
 * Thin changes get an outline so they stay visible when zoomed out.
 */
export function XorOverlay({ difference, layerKey, height = 420 }: { difference: GeometryDifference; layerKey: string | 'all'; height?: number }) {
  const paths = useMemo(() => {
    if (typeof Path2D === 'undefined') return null;
    const layers = difference.layers.filter((l) => layerKey === 'all' || `${l.layer}/${l.datatype}` === layerKey);
    return { added: polygonPath(layers.flatMap((l) => l.added)), removed: polygonPath(layers.flatMap((l) => l.removed)) };
  }, [difference, layerKey]);

  const draw = useCallback(
    ({ ctx, view, inWorld, fillBounds, outlineBounds }: CanvasFrame) => {
      if (!paths) return;
      fillBounds('#ffffff');
      inWorld(() => {
        // One screen pixel wide at any zoom.
        ctx.lineWidth = 1 / view.pxPerUm;
        for (const [path, colour] of [[paths.removed, REMOVED], [paths.added, ADDED]] as const) {
          ctx.fillStyle = colour;
          ctx.strokeStyle = colour;
          ctx.fill(path, 'nonzero');
          ctx.stroke(path);
        }
      });
      outlineBounds();
    },
    [paths],
  );

  const viewport = useCanvasViewport({ bounds: difference.bounds, height, draw });

  return (
    <div className="flex flex-col gap-2" data-testid="xor-overlay">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <button type="button" className={TOOL_BUTTON} onClick={viewport.fit} disabled={!difference.bounds}>
          Both masks
        </button>
        <ZoomButtons viewport={viewport} />
        <span className="ml-auto flex items-center gap-3 text-xs">
          <Swatch colour={ADDED} label="added in B" />
          <Swatch colour={REMOVED} label="removed from A" />
        </span>
      </div>
      <ViewportStage
        viewport={viewport}
        label="Geometry difference: added regions teal, removed regions amber; drag to pan, wheel or + and − to zoom, arrow keys to move, 0 to fit"
      />
    </div>
  );
}
