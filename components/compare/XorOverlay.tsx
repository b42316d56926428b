'use client';

import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { fitBounds, scaleBar, toMask, toScreen, zoomAt, type Viewport } from '@/components/mask-view/viewport';
import type { GeometryDifference } from '@/lib/workflow/geometry-difference';

const ADDED = '#1b9e77';
const REMOVED = '#d95f02';
const PAPER = '#f7f7f2';
const HAIRLINE = '#d9d6cc';
const ZOOM_STEP = 1.5;

function pathOf(polygons: number[][]): Path2D {
  const path = new Path2D();
  for (const p of polygons) {
    if (p.length < 6) continue;
    path.moveTo(p[0], p[1]);
    for (let i = 2; i < p.length; i += 2) path.lineTo(p[i], p[i + 1]);
    path.closePath();
  }
  return path;
}

/**
 * The changed regions of two masks over the extent of both: added teal, removed amber.
 * Drag to pan, wheel or + and − to zoom, 0 to see everything. Thin changes get an outline so
 * they stay visible when zoomed out.
 */
export function XorOverlay({ difference, layerKey, height = 420 }: { difference: GeometryDifference; layerKey: string | 'all'; height?: number }) {
  const wrapRef = useRef<HTMLDivElement>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const [width, setWidth] = useState(0);
  const [view, setView] = useState<Viewport | null>(null);
  const [cursor, setCursor] = useState<[number, number] | null>(null);
  const drag = useRef<{ sx: number; sy: number; start: Viewport } | null>(null);

  const paths = useMemo(() => {
    if (typeof Path2D === 'undefined') return null;
    const layers = difference.layers.filter((l) => layerKey === 'all' || `${l.layer}/${l.datatype}` === layerKey);
    return { added: pathOf(layers.flatMap((l) => l.added)), removed: pathOf(layers.flatMap((l) => l.removed)) };
  }, [difference, layerKey]);

  const bounds = difference.bounds;
  const fit = useCallback(() => {
    if (bounds && width > 0) setView(fitBounds(bounds, width, height));
  }, [bounds, width, height]);
  const limits = useMemo(() => {
    if (!bounds || width === 0) return { min: 1e-6, max: 1e6 };
    const whole = fitBounds(bounds, width, height).pxPerUm;
    return { min: whole / 2, max: whole * 1e5 };
  }, [bounds, width, height]);

  useEffect(() => {
    const el = wrapRef.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => setWidth(Math.floor(entry.contentRect.width)));
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  useEffect(() => {
    if (!view) fit();
  }, [fit, view]);

  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas || width === 0) return;
    const dpr = window.devicePixelRatio || 1;
    canvas.width = width * dpr;
    canvas.height = height * dpr;
    const ctx = canvas.getContext('2d');
    if (!ctx) return;
    ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
    ctx.fillStyle = PAPER;
    ctx.fillRect(0, 0, width, height);
    if (!view || !bounds || !paths) return;
    const [bx0, by0] = toScreen(view, width, height, bounds.x0, bounds.y1);
    const [bx1, by1] = toScreen(view, width, height, bounds.x1, bounds.y0);
    ctx.fillStyle = '#ffffff';
    ctx.fillRect(bx0, by0, bx1 - bx0, by1 - by0);
    const s = view.pxPerUm;
    ctx.save();
    ctx.setTransform(dpr * s, 0, 0, -dpr * s, dpr * (width / 2 - s * view.cx), dpr * (height / 2 + s * view.cy));
    ctx.lineWidth = 1 / s;
    for (const [path, colour] of [[paths.removed, REMOVED], [paths.added, ADDED]] as const) {
      ctx.fillStyle = colour;
      ctx.strokeStyle = colour;
      ctx.fill(path, 'nonzero');
      ctx.stroke(path);
    }
    ctx.restore();
    ctx.strokeStyle = HAIRLINE;
    ctx.strokeRect(Math.round(bx0) + 0.5, Math.round(by0) + 0.5, Math.round(bx1 - bx0), Math.round(by1 - by0));
  }, [view, width, height, bounds, paths]);

  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas) return;
    const stop = (e: WheelEvent) => e.preventDefault();
    canvas.addEventListener('wheel', stop, { passive: false });
    return () => canvas.removeEventListener('wheel', stop);
  }, []);

  const local = (e: { clientX: number; clientY: number }): [number, number] => {
    const rect = canvasRef.current!.getBoundingClientRect();
    return [e.clientX - rect.left, e.clientY - rect.top];
  };
  const zoomCentre = (factor: number) => view && setView(zoomAt(view, width, height, width / 2, height / 2, factor, limits));
  const bar = view ? scaleBar(view.pxPerUm) : null;
  const tool = 'rounded border border-hairline bg-paper px-2 py-1 text-ink hover:bg-open focus:outline-none focus-visible:ring-2 focus-visible:ring-accent';

  return (
    <div className="flex flex-col gap-2" data-testid="xor-overlay">
      <div className="flex flex-wrap items-center gap-2 text-sm">
        <button type="button" className={tool} onClick={fit}>
          Both masks
        </button>
        <button type="button" className={tool} aria-label="Zoom in" onClick={() => zoomCentre(ZOOM_STEP)}>
          +
        </button>
        <button type="button" className={tool} aria-label="Zoom out" onClick={() => zoomCentre(1 / ZOOM_STEP)}>
          −
        </button>
        <span className="ml-auto flex items-center gap-3 text-xs">
          <span className="flex items-center gap-1">
            <span className="inline-block h-3 w-3 rounded-sm" style={{ background: ADDED }} /> added in B
          </span>
          <span className="flex items-center gap-1">
            <span className="inline-block h-3 w-3 rounded-sm" style={{ background: REMOVED }} /> removed from A
          </span>
        </span>
      </div>
      <div ref={wrapRef} className="relative w-full overflow-hidden rounded border border-hairline" style={{ height }}>
        <canvas
          ref={canvasRef}
          tabIndex={0}
          role="img"
          aria-label="Geometry difference: added regions teal, removed regions amber; drag to pan, wheel or + and − to zoom, 0 to fit"
          className="block focus:outline-none focus-visible:ring-2 focus-visible:ring-accent"
          style={{ width, height, cursor: 'grab', touchAction: 'none' }}
          onWheel={(e) => {
            if (!view) return;
            const [sx, sy] = local(e);
            setView(zoomAt(view, width, height, sx, sy, e.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP, limits));
          }}
          onPointerDown={(e) => {
            if (!view) return;
            const [sx, sy] = local(e);
            drag.current = { sx, sy, start: view };
            (e.target as Element).setPointerCapture(e.pointerId);
          }}
          onPointerMove={(e) => {
            if (!view) return;
            const [sx, sy] = local(e);
            setCursor(toMask(view, width, height, sx, sy));
            const d = drag.current;
            if (d) setView({ ...d.start, cx: d.start.cx - (sx - d.sx) / d.start.pxPerUm, cy: d.start.cy + (sy - d.sy) / d.start.pxPerUm });
          }}
          onPointerUp={() => (drag.current = null)}
          onPointerLeave={() => setCursor(null)}
          onKeyDown={(e) => {
            if (e.key === '+' || e.key === '=') zoomCentre(ZOOM_STEP);
            else if (e.key === '-') zoomCentre(1 / ZOOM_STEP);
            else if (e.key === '0') fit();
            else return;
            e.preventDefault();
          }}
        />
        {bar ? (
          <div className="pointer-events-none absolute bottom-2 left-2 rounded bg-paper/90 px-2 py-1 font-mono text-xs">
            <div style={{ width: bar.lengthPx }} className="h-1 border-x border-b border-ink" />
            <span>{bar.label}</span>
          </div>
        ) : null}
        <div className="pointer-events-none absolute bottom-2 right-2 rounded bg-paper/90 px-2 py-1 font-mono text-xs">
          {cursor ? `x ${cursor[0].toFixed(3)} µm  y ${cursor[1].toFixed(3)} µm` : 'x — µm  y — µm'}
        </div>
      </div>
    </div>
  );
}
