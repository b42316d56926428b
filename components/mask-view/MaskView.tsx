'use client';

import { useCallback, useMemo, useState } from 'react';
import type { LayoutLibrary } from '@/lib/layout/types';
import { flattenLibrary } from './flatten';
import { tilePolygons, overlaps, type Tile } from './tiles';
import { formatLength } from './viewport';
import { CHROME, INK, OPEN, PAPER, WARNING, layerColour } from './layer-colours';
import { polygonPath } from './polygon-path';
import { useCanvasViewport, type CanvasFrame } from './use-canvas-viewport';
import { Swatch, TOOL_BUTTON, ViewportStage, ZoomButtons } from './ViewportStage';

/** A feature the view should point out, e.g. the narrowest zone (µm). */
export interface MaskMarker {
  x: number;
  y: number;
  /** feature width in µm, written beside the marker */
  width?: number;
  label?: string;
}

/** A numbered pin on the mask, e.g. a comment anchored to a point (µm). */
export interface MaskPin {
  x: number;
  y: number;
  label: string;
}

export interface MaskViewProps {
  library: LayoutLibrary | null;
  /** whether drawn polygons are chrome (default) or open areas of the mask */
  polygonsAre?: 'chrome' | 'open';
  markers?: MaskMarker[];
  pins?: MaskPin[];
  /** When given, a "Pin a point" button appears; the next click on the mask reports its position in µm. */
  onPickPoint?: (point: { x: number; y: number }) => void;
  height?: number;
  /** shown instead of the mask when there is no library yet */
  emptyText?: string;
}

interface DrawLayer {
  colour: string;
  name: string;
  tiles: { tile: Tile; path: Path2D }[];
}

export function MaskView({
  library,
  polygonsAre = 'chrome',
  markers = [],
  pins = [],
  onPickPoint,
  height = 480,
  emptyText = 'No mask to show yet.',
}: MaskViewProps) {
  const [picking, setPicking] = useState(false);

  const flat = useMemo(() => (library ? flattenLibrary(library) : null), [library]);
  const dbuUm = library ? library.databaseUnit / 1e-6 : 0.001;
  const drawnTone = polygonsAre === 'chrome' ? CHROME : OPEN;
  const undrawnTone = polygonsAre === 'chrome' ? OPEN : CHROME;

  const layers = useMemo<DrawLayer[]>(() => {
    if (!flat?.bounds || typeof Path2D === 'undefined') return [];
    const bounds = flat.bounds;
    return flat.layers.map((l, index) => ({
      colour: index === 0 ? drawnTone : layerColour(index),
      name: l.name,
      tiles: tilePolygons(l.polygons, bounds).map((tile) => ({ tile, path: polygonPath(tile.polygons) })),
    }));
  }, [flat, drawnTone]);

  const draw = useCallback(
    ({ ctx, view, width, visible, toScreen, inWorld, fillBounds, outlineBounds }: CanvasFrame) => {
      fillBounds(undrawnTone);
      inWorld(() => {
        layers.forEach((layer, index) => {
          ctx.fillStyle = layer.colour;
          ctx.globalAlpha = index === 0 ? 1 : 0.6;
          for (const { tile, path } of layer.tiles) {
            if (overlaps(tile.bounds, visible)) ctx.fill(path, 'nonzero');
          }
        });
      });
      outlineBounds();

      // Canvas fonts cannot read CSS variables; resolve the page's mono family first.
      const mono = getComputedStyle(ctx.canvas).getPropertyValue('--font-mono').trim();
      ctx.font = `11px ${mono ? `${mono}, ` : ''}ui-monospace, monospace`;
      for (const m of markers) {
        const [mx, my] = toScreen(m.x, m.y);
        const r = Math.max(8, ((m.width ?? 0) * view.pxPerUm) / 2 + 4);
        ctx.strokeStyle = WARNING;
        ctx.lineWidth = 2;
        ctx.beginPath();
        ctx.arc(mx, my, r, 0, 2 * Math.PI);
        ctx.stroke();
        const text = m.label ?? (m.width !== undefined ? `narrowest ${formatLength(m.width)}` : 'narrowest');
        // The label goes to the left of the ring when it would run off the right edge.
        const textWidth = ctx.measureText(text).width;
        const tx = mx + r + 4 + textWidth > width ? mx - r - 4 - textWidth : mx + r + 4;
        // A paper backing keeps the label legible over dense zones.
        ctx.fillStyle = 'rgba(247, 247, 242, 0.9)';
        ctx.fillRect(tx - 2, my - 15, textWidth + 4, 15);
        ctx.fillStyle = WARNING;
        ctx.fillText(text, tx, my - 4);
      }
      for (const p of pins) {
        const [px, py] = toScreen(p.x, p.y);
        ctx.fillStyle = INK;
        ctx.beginPath();
        ctx.arc(px, py, 7, 0, 2 * Math.PI);
        ctx.fill();
        ctx.fillStyle = PAPER;
        ctx.textAlign = 'center';
        ctx.fillText(p.label, px, py + 4);
        ctx.textAlign = 'start';
      }
    },
    [layers, markers, pins, undrawnTone],
  );

  const viewport = useCanvasViewport({
    bounds: flat?.bounds ?? null,
    height,
    // Zoom in until one database unit spans 40 px.
    maxPxPerUm: 40 / dbuUm,
    draw,
    // Anchors land on the database grid, like the geometry they point at.
    onClick:
      picking && onPickPoint
        ? (x, y) => {
            onPickPoint({ x: Math.round(x / dbuUm) * dbuUm, y: Math.round(y / dbuUm) * dbuUm });
            setPicking(false);
          }
        : undefined,
    onEscape: () => setPicking(false),
  });
  const { view, width, centreOn } = viewport;

  const goToNarrowest = useCallback(() => {
    const m = markers[0];
    if (!m || width === 0) return;
    // Show the feature about 40 px wide, or 20 database units across the view when its width is unknown.
    centreOn(m.x, m.y, m.width && m.width > 0 ? 40 / m.width : width / (20 * dbuUm));
  }, [markers, width, dbuUm, centreOn]);

  return (
    <div className="flex flex-col gap-2" data-testid="mask-view">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <button type="button" className={TOOL_BUTTON} onClick={viewport.fit} disabled={!flat?.bounds}>
          Whole aperture
        </button>
        <button type="button" className={TOOL_BUTTON} onClick={goToNarrowest} disabled={markers.length === 0}>
          Narrowest feature
        </button>
        <ZoomButtons viewport={viewport} />
        {onPickPoint && (
          <button
            type="button"
            className={TOOL_BUTTON}
            aria-pressed={picking}
            onClick={() => setPicking((p) => !p)}
            disabled={!view}
          >
            {picking ? 'Click the mask… (Esc cancels)' : 'Pin a point'}
          </button>
        )}
        <span className="ml-auto flex items-center gap-3 text-xs">
          <Swatch colour={drawnTone} label={`${layers[0]?.name ?? 'polygons'} (drawn)`} />
          <Swatch colour={undrawnTone} label="not drawn" />
          {layers.slice(1).map((l) => (
            <Swatch key={l.name} colour={l.colour} label={l.name} />
          ))}
        </span>
      </div>
      <ViewportStage
        viewport={viewport}
        label="Mask view: drag to pan, wheel or + and − to zoom, arrow keys to move, 0 to show the whole aperture"
        cursor={picking ? 'crosshair' : 'grab'}
      >
        {!flat?.bounds && (
          <p className="absolute inset-0 flex items-center justify-center text-sm text-ink/60">{emptyText}</p>
        )}
        {flat?.truncated && (
          <p className="absolute left-2 top-2 rounded bg-paper/90 px-2 py-1 text-xs text-warning">
            Showing the first {flat.vertexCount.toLocaleString('en')} vertices; the bundle holds the whole mask.
          </p>
        )}
      </ViewportStage>
    </div>
  );
}
