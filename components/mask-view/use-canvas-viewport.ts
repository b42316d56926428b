'use client';

import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { Bounds } from './flatten';
import { HAIRLINE, PAPER } from './layer-colours';
import {
  clampZoom,
  fitBounds,
  panBy,
  toMask,
  toScreen,
  viewForKey,
  visibleBounds,
  worldToCanvas,
  zoomAt,
  zoomLimits,
  ZOOM_STEP,
  type Viewport,
} from './viewport';

/** What a draw callback gets: the context in screen pixels (y down) over a paper background. */
export interface CanvasFrame {
  ctx: CanvasRenderingContext2D;
  view: Viewport;
  width: number;
  height: number;
  /** the mask-plane box on screen, for skipping what lies outside it */
  visible: Bounds;
  toScreen(x: number, y: number): [number, number];
  /** Runs `paint` with the context drawing mask-plane µm (y up), then returns to screen pixels. */
  inWorld(paint: () => void): void;
  /** Fills the content bounds' box on screen. */
  fillBounds(colour: string): void;
  /** Draws the content bounds' box as a crisp 1 px hairline. */
  outlineBounds(): void;
}

export interface CanvasViewportOptions {
  /** the extent that "fit" shows; null while there is nothing to show */
  bounds: Bounds | null;
  /** canvas height in CSS pixels; the width follows the container */
  height: number;
  /** zoom-in limit in px/µm (at least the fit); by default 10⁵ × the fit */
  maxPxPerUm?: number;
  /** paints one frame; keep it stable (useCallback) so the canvas redraws only when something changed */
  draw: (frame: CanvasFrame) => void;
  /** a press and release without dragging, at that mask-plane point (µm) */
  onClick?: (x: number, y: number) => void;
  onEscape?: () => void;
}

/** Below this many pixels of movement a press is a click, not a drag. */
const DRAG_THRESHOLD_PX = 3;

/**
 * The view transform of a zoomable mask-plane canvas: fit to bounds, wheel zoom about the cursor,
 * drag pan, keys (+ − arrows 0), double-click zoom, device-pixel-ratio sizing and the cursor's position.
 * Spread `handlers` on the canvas and attach `wrapRef` / `canvasRef` (ViewportStage does all three).
 */
export function useCanvasViewport({ bounds, height, maxPxPerUm, draw, onClick, onEscape }: CanvasViewportOptions) {
  const wrapRef = useRef<HTMLDivElement>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const [width, setWidth] = useState(0);
  const [view, setView] = useState<Viewport | null>(null);
  const [cursor, setCursor] = useState<[number, number] | null>(null);
  const drag = useRef<{ sx: number; sy: number; start: Viewport; moved: boolean } | null>(null);

  const limits = useMemo(() => {
    if (!bounds || width === 0) return { min: 1e-6, max: 1e6 };
    return zoomLimits(fitBounds(bounds, width, height).pxPerUm, maxPxPerUm);
  }, [bounds, width, height, maxPxPerUm]);

  const fit = useCallback(() => {
    if (bounds && width > 0) setView(fitBounds(bounds, width, height));
  }, [bounds, width, height]);

  /** Centres the view on (x, y) µm at `pxPerUm`, kept within the zoom limits. */
  const centreOn = useCallback(
    (x: number, y: number, pxPerUm: number) => setView({ cx: x, cy: y, pxPerUm: clampZoom(pxPerUm, limits) }),
    [limits],
  );

  const zoomAtCentre = (factor: number) => view && setView(zoomAt(view, width, height, width / 2, height / 2, factor, limits));

  // The element's width is measured; the height is the caller's.
  useEffect(() => {
    const el = wrapRef.current;
    if (!el) return;
    const observer = new ResizeObserver(([entry]) => setWidth(Math.floor(entry.contentRect.width)));
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  // New content keeps the current view when one exists, so a live preview does not jump while typing.
  useEffect(() => {
    if (!view) fit();
  }, [fit, view]);

  // The backing store follows the device pixel ratio so hairlines stay sharp on dense screens.
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
    if (!view || !bounds) return;
    const [bx0, by0] = toScreen(view, width, height, bounds.x0, bounds.y1);
    const [bx1, by1] = toScreen(view, width, height, bounds.x1, bounds.y0);
    draw({
      ctx,
      view,
      width,
      height,
      visible: visibleBounds(view, width, height),
      toScreen: (x, y) => toScreen(view, width, height, x, y),
      inWorld(paint) {
        ctx.save();
        ctx.setTransform(...worldToCanvas(view, width, height, dpr));
        paint();
        ctx.restore();
      },
      fillBounds(colour) {
        ctx.fillStyle = colour;
        ctx.fillRect(bx0, by0, bx1 - bx0, by1 - by0);
      },
      outlineBounds() {
        ctx.strokeStyle = HAIRLINE;
        ctx.lineWidth = 1;
        ctx.strokeRect(Math.round(bx0) + 0.5, Math.round(by0) + 0.5, Math.round(bx1 - bx0), Math.round(by1 - by0));
      },
    });
  }, [view, width, height, bounds, draw]);

  // The page must not scroll while the wheel zooms; React's wheel listener is passive.
  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas) return;
    const stop = (e: WheelEvent) => e.preventDefault();
    canvas.addEventListener('wheel', stop, { passive: false });
    return () => canvas.removeEventListener('wheel', stop);
  }, []);

  const localPoint = (e: { clientX: number; clientY: number }): [number, number] => {
    const rect = canvasRef.current!.getBoundingClientRect();
    return [e.clientX - rect.left, e.clientY - rect.top];
  };

  const handlers = {
    onWheel(e: React.WheelEvent) {
      if (!view) return;
      const [sx, sy] = localPoint(e);
      setView(zoomAt(view, width, height, sx, sy, e.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP, limits));
    },
    onPointerDown(e: React.PointerEvent) {
      if (!view) return;
      const [sx, sy] = localPoint(e);
      drag.current = { sx, sy, start: view, moved: false };
      (e.target as Element).setPointerCapture(e.pointerId);
    },
    onPointerMove(e: React.PointerEvent) {
      if (!view) return;
      const [sx, sy] = localPoint(e);
      setCursor(toMask(view, width, height, sx, sy));
      const d = drag.current;
      if (!d) return;
      const dx = sx - d.sx;
      const dy = sy - d.sy;
      if (Math.abs(dx) + Math.abs(dy) > DRAG_THRESHOLD_PX) d.moved = true;
      if (d.moved) setView(panBy(d.start, dx, dy));
    },
    onPointerUp(e: React.PointerEvent) {
      const d = drag.current;
      drag.current = null;
      if (!d || d.moved || !onClick || !view) return;
      const [sx, sy] = localPoint(e);
      onClick(...toMask(view, width, height, sx, sy));
    },
    onPointerLeave() {
      setCursor(null);
    },
    onDoubleClick(e: React.MouseEvent) {
      if (!view) return;
      const [sx, sy] = localPoint(e);
      setView(zoomAt(view, width, height, sx, sy, 2, limits));
    },
    onKeyDown(e: React.KeyboardEvent) {
      if (e.key === 'Escape') {
        onEscape?.();
        return;
      }
      if (!view) return;
      const next = viewForKey(view, e.key, width, height, limits);
      if (next === null) return;
      if (next === 'fit') fit();
      else setView(next);
      e.preventDefault();
    },
  };

  return { wrapRef, canvasRef, width, height, view, cursor, limits, fit, centreOn, zoomAtCentre, handlers };
}

export type CanvasViewport = ReturnType<typeof useCanvasViewport>;
