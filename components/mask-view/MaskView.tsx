'use client';

import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { LayoutLibrary } from '@/lib/layout/types';
import { flattenLibrary, type Bounds } from './flatten';
import { tilePolygons, overlaps, type Tile } from './tiles';
import { fitBounds, formatLength, scaleBar, toMask, toScreen, visibleBounds, zoomAt, type Viewport } from './viewport';
import { CHROME, HAIRLINE, INK, OPEN, PAPER, WARNING, layerColour } from './layer-colours';

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

function buildPath(tile: Tile): Path2D {
  const path = new Path2D();
  for (const p of tile.polygons) {
    if (p.length < 6) continue;
    path.moveTo(p[0], p[1]);
    for (let i = 2; i < p.length; i += 2) path.lineTo(p[i], p[i + 1]);
    path.closePath();
  }
  return path;
}

const ZOOM_STEP = 1.5;
const TOOL =
  'rounded border border-hairline bg-paper px-2 py-1 text-ink hover:bg-open disabled:opacity-40 focus:outline-none focus-visible:ring-2 focus-visible:ring-accent';

export function MaskView({
  library,
  polygonsAre = 'chrome',
  markers = [],
  pins = [],
  onPickPoint,
  height = 480,
  emptyText = 'No mask to show yet.',
}: MaskViewProps) {
  const wrapRef = useRef<HTMLDivElement>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const [size, setSize] = useState({ width: 0, height });
  const [view, setView] = useState<Viewport | null>(null);
  const [cursor, setCursor] = useState<[number, number] | null>(null);
  const [picking, setPicking] = useState(false);
  const drag = useRef<{ sx: number; sy: number; start: Viewport; moved: boolean } | null>(null);

  const flat = useMemo(() => (library ? flattenLibrary(library) : null), [library]);
  const dbuUm = library ? library.databaseUnit / 1e-6 : 0.001;

  const layers = useMemo<DrawLayer[]>(() => {
    if (!flat?.bounds || typeof Path2D === 'undefined') return [];
    const bounds = flat.bounds;
    return flat.layers.map((l, index) => ({
      colour: index === 0 ? (polygonsAre === 'chrome' ? CHROME : OPEN) : layerColour(index),
      name: l.name,
      tiles: tilePolygons(l.polygons, bounds).map((tile) => ({ tile, path: buildPath(tile) })),
    }));
  }, [flat, polygonsAre]);

  const limits = useMemo(() => {
    if (!flat?.bounds || size.width === 0) return { min: 1e-6, max: 1e6 };
    const fit = fitBounds(flat.bounds, size.width, size.height).pxPerUm;
    // Zoom out to half the whole mask, in until one database unit spans 40 px.
    return { min: fit / 2, max: Math.max(fit, 40 / dbuUm) };
  }, [flat, size, dbuUm]);

  const fitAll = useCallback(() => {
    if (flat?.bounds && size.width > 0) setView(fitBounds(flat.bounds, size.width, size.height));
  }, [flat, size]);

  const goToNarrowest = useCallback(() => {
    const m = markers[0];
    if (!m || size.width === 0) return;
    // Show the feature about 40 px wide, or 20 database units across the view when its width is unknown.
    const pxPerUm = m.width && m.width > 0 ? 40 / m.width : size.width / (20 * dbuUm);
    setView({ cx: m.x, cy: m.y, pxPerUm: Math.min(limits.max, Math.max(limits.min, pxPerUm)) });
  }, [markers, size, dbuUm, limits]);

  // Track the element size; the canvas backing store follows the device pixel ratio.
  useEffect(() => {
    const el = wrapRef.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => {
      setSize({ width: Math.floor(entry.contentRect.width), height });
    });
    observer.observe(el);
    return () => observer.disconnect();
  }, [height]);

  // A new mask keeps the current view when one exists, so live preview does not jump while typing.
  useEffect(() => {
    if (!view) fitAll();
  }, [fitAll, view]);

  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas || size.width === 0) return;
    const dpr = window.devicePixelRatio || 1;
    canvas.width = size.width * dpr;
    canvas.height = size.height * dpr;
    const ctx = canvas.getContext('2d');
    if (!ctx) return;
    ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
    ctx.fillStyle = PAPER;
    ctx.fillRect(0, 0, size.width, size.height);
    if (!view || !flat?.bounds) return;

    const b = flat.bounds;
    const [bx0, by0] = toScreen(view, size.width, size.height, b.x0, b.y1);
    const [bx1, by1] = toScreen(view, size.width, size.height, b.x1, b.y0);
    ctx.fillStyle = polygonsAre === 'chrome' ? OPEN : CHROME;
    ctx.fillRect(bx0, by0, bx1 - bx0, by1 - by0);

    const visible: Bounds = visibleBounds(view, size.width, size.height);
    const s = view.pxPerUm;
    ctx.save();
    ctx.setTransform(dpr * s, 0, 0, -dpr * s, dpr * (size.width / 2 - s * view.cx), dpr * (size.height / 2 + s * view.cy));
    layers.forEach((layer, index) => {
      ctx.fillStyle = layer.colour;
      ctx.globalAlpha = index === 0 ? 1 : 0.6;
      for (const { tile, path } of layer.tiles) {
        if (overlaps(tile.bounds, visible)) ctx.fill(path, 'nonzero');
      }
    });
    ctx.restore();

    ctx.strokeStyle = HAIRLINE;
    ctx.lineWidth = 1;
    ctx.strokeRect(Math.round(bx0) + 0.5, Math.round(by0) + 0.5, Math.round(bx1 - bx0), Math.round(by1 - by0));

    // Canvas fonts cannot read CSS variables; resolve the page's mono family first.
    const mono = getComputedStyle(canvas).getPropertyValue('--font-mono').trim();
    ctx.font = `11px ${mono ? `${mono}, ` : ''}ui-monospace, monospace`;
    for (const m of markers) {
      const [mx, my] = toScreen(view, size.width, size.height, m.x, m.y);
      const r = Math.max(8, ((m.width ?? 0) * s) / 2 + 4);
      ctx.strokeStyle = WARNING;
      ctx.lineWidth = 2;
      ctx.beginPath();
      ctx.arc(mx, my, r, 0, 2 * Math.PI);
      ctx.stroke();
      const text = m.label ?? (m.width !== undefined ? `narrowest ${formatLength(m.width)}` : 'narrowest');
      ctx.fillStyle = WARNING;
      // The label goes to the left of the ring when it would run off the right edge.
      const textWidth = ctx.measureText(text).width;
      const tx = mx + r + 4 + textWidth > size.width ? mx - r - 4 - textWidth : mx + r + 4;
      // A paper backing keeps the label legible over dense zones.
      ctx.fillStyle = 'rgba(247, 247, 242, 0.9)';
      ctx.fillRect(tx - 2, my - 15, textWidth + 4, 15);
      ctx.fillStyle = WARNING;
      ctx.fillText(text, tx, my - 4);
    }
    for (const p of pins) {
      const [px, py] = toScreen(view, size.width, size.height, p.x, p.y);
      ctx.fillStyle = INK;
      ctx.beginPath();
      ctx.arc(px, py, 7, 0, 2 * Math.PI);
      ctx.fill();
      ctx.fillStyle = PAPER;
      ctx.textAlign = 'center';
      ctx.fillText(p.label, px, py + 4);
      ctx.textAlign = 'start';
    }
  }, [view, size, flat, layers, markers, pins, polygonsAre]);

  const localPoint = (e: { clientX: number; clientY: number }): [number, number] => {
    const rect = canvasRef.current!.getBoundingClientRect();
    return [e.clientX - rect.left, e.clientY - rect.top];
  };

  const onWheel = (e: React.WheelEvent) => {
    if (!view) return;
    const [sx, sy] = localPoint(e);
    setView(zoomAt(view, size.width, size.height, sx, sy, e.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP, limits));
  };

  // The page must not scroll while the wheel zooms the mask; React's wheel listener is passive.
  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas) return;
    const stop = (e: WheelEvent) => e.preventDefault();
    canvas.addEventListener('wheel', stop, { passive: false });
    return () => canvas.removeEventListener('wheel', stop);
  }, []);

  const onPointerDown = (e: React.PointerEvent) => {
    if (!view) return;
    const [sx, sy] = localPoint(e);
    drag.current = { sx, sy, start: view, moved: false };
    (e.target as Element).setPointerCapture(e.pointerId);
  };

  const onPointerMove = (e: React.PointerEvent) => {
    if (!view) return;
    const [sx, sy] = localPoint(e);
    setCursor(toMask(view, size.width, size.height, sx, sy));
    const d = drag.current;
    if (!d) return;
    const dx = sx - d.sx;
    const dy = sy - d.sy;
    if (Math.abs(dx) + Math.abs(dy) > 3) d.moved = true;
    if (d.moved) {
      setView({ ...d.start, cx: d.start.cx - dx / d.start.pxPerUm, cy: d.start.cy + dy / d.start.pxPerUm });
    }
  };

  const onPointerUp = (e: React.PointerEvent) => {
    const d = drag.current;
    drag.current = null;
    if (!d || d.moved || !picking || !onPickPoint || !view) return;
    const [sx, sy] = localPoint(e);
    const [x, y] = toMask(view, size.width, size.height, sx, sy);
    // Anchors land on the database grid, like the geometry they point at.
    onPickPoint({ x: Math.round(x / dbuUm) * dbuUm, y: Math.round(y / dbuUm) * dbuUm });
    setPicking(false);
  };

  const onKeyDown = (e: React.KeyboardEvent) => {
    if (!view) return;
    const panPx = 60 / view.pxPerUm;
    const c = { w: size.width / 2, h: size.height / 2 };
    const keys: Record<string, () => Viewport> = {
      '+': () => zoomAt(view, size.width, size.height, c.w, c.h, ZOOM_STEP, limits),
      '=': () => zoomAt(view, size.width, size.height, c.w, c.h, ZOOM_STEP, limits),
      '-': () => zoomAt(view, size.width, size.height, c.w, c.h, 1 / ZOOM_STEP, limits),
      ArrowLeft: () => ({ ...view, cx: view.cx - panPx }),
      ArrowRight: () => ({ ...view, cx: view.cx + panPx }),
      ArrowUp: () => ({ ...view, cy: view.cy + panPx }),
      ArrowDown: () => ({ ...view, cy: view.cy - panPx }),
    };
    if (e.key === '0') {
      fitAll();
      e.preventDefault();
    } else if (keys[e.key]) {
      setView(keys[e.key]());
      e.preventDefault();
    } else if (e.key === 'Escape') {
      setPicking(false);
    }
  };

  const bar = view ? scaleBar(view.pxPerUm) : null;
  const zoomCentre = (factor: number) =>
    view && setView(zoomAt(view, size.width, size.height, size.width / 2, size.height / 2, factor, limits));

  return (
    <div className="flex flex-col gap-2" data-testid="mask-view">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <button type="button" className={TOOL} onClick={fitAll} disabled={!flat?.bounds}>
          Whole aperture
        </button>
        <button type="button" className={TOOL} onClick={goToNarrowest} disabled={markers.length === 0}>
          Narrowest feature
        </button>
        <button type="button" className={TOOL} aria-label="Zoom in" onClick={() => zoomCentre(ZOOM_STEP)} disabled={!view}>
          +
        </button>
        <button type="button" className={TOOL} aria-label="Zoom out" onClick={() => zoomCentre(1 / ZOOM_STEP)} disabled={!view}>
          −
        </button>
        {onPickPoint && (
          <button
            type="button"
            className={TOOL}
            aria-pressed={picking}
            onClick={() => setPicking((p) => !p)}
            disabled={!view}
          >
            {picking ? 'Click the mask… (Esc cancels)' : 'Pin a point'}
          </button>
        )}
        <span className="ml-auto flex items-center gap-3 text-xs">
          <Swatch colour={polygonsAre === 'chrome' ? CHROME : OPEN} label={`${layers[0]?.name ?? 'polygons'} (drawn)`} />
          <Swatch colour={polygonsAre === 'chrome' ? OPEN : CHROME} label="not drawn" />
          {layers.slice(1).map((l) => (
            <Swatch key={l.name} colour={l.colour} label={l.name} />
          ))}
        </span>
      </div>
      <div ref={wrapRef} className="relative w-full overflow-hidden rounded border border-hairline" style={{ height }}>
        <canvas
          ref={canvasRef}
          tabIndex={0}
          role="img"
          aria-label="Mask view: drag to pan, wheel or + and − to zoom, 0 to show the whole aperture"
          className="block focus:outline-none focus-visible:ring-2 focus-visible:ring-accent"
          style={{ width: size.width, height: size.height, cursor: picking ? 'crosshair' : 'grab', touchAction: 'none' }}
          onWheel={onWheel}
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={onPointerUp}
          onPointerLeave={() => setCursor(null)}
          onDoubleClick={(e) => {
            if (!view) return;
            const [sx, sy] = localPoint(e);
            setView(zoomAt(view, size.width, size.height, sx, sy, 2, limits));
          }}
          onKeyDown={onKeyDown}
        />
        {!flat?.bounds && (
          <p className="absolute inset-0 flex items-center justify-center text-sm text-ink/60">{emptyText}</p>
        )}
        {bar && (
          <div className="pointer-events-none absolute bottom-2 left-2 rounded bg-paper/90 px-2 py-1 font-mono text-xs text-ink">
            <div style={{ width: bar.lengthPx }} className="h-1 border-x border-b border-ink" />
            <span data-testid="scale-bar">{bar.label}</span>
          </div>
        )}
        <div
          className="pointer-events-none absolute bottom-2 right-2 rounded bg-paper/90 px-2 py-1 font-mono text-xs text-ink"
          data-testid="cursor-position"
        >
          {cursor ? `x ${cursor[0].toFixed(3)} µm  y ${cursor[1].toFixed(3)} µm` : 'x — µm  y — µm'}
        </div>
        {flat?.truncated && (
          <p className="absolute left-2 top-2 rounded bg-paper/90 px-2 py-1 text-xs text-warning">
            Showing the first {flat.vertexCount.toLocaleString('en')} vertices; the bundle holds the whole mask.
          </p>
        )}
      </div>
    </div>
  );
}

function Swatch({ colour, label }: { colour: string; label: string }) {
  return (
    <span className="flex items-center gap-1">
      <span className="inline-block h-3 w-3 rounded-sm border border-hairline" style={{ background: colour }} />
      {label}
    </span>
  );
}
