'use client';

import { useEffect, useRef } from 'react';
import type { FocalMap } from '@/lib/optics';

/** Paper to ink: one hue, lightness only, so it reads the same to every eye and in print. */
function shade(t: number): [number, number, number] {
  const paper = [247, 247, 242];
  const ink = [20, 33, 61];
  const s = Math.sqrt(Math.max(0, Math.min(1, t)));
  return [0, 1, 2].map((c) => Math.round(paper[c] + (ink[c] - paper[c]) * s)) as [number, number, number];
}

/** A focal-plane intensity map drawn pixel for pixel on a canvas, with its scale in µm. */
export function HeatMap({ map, label }: { map: FocalMap; label: string }) {
  const canvas = useRef<HTMLCanvasElement>(null);
  useEffect(() => {
    const context = canvas.current?.getContext('2d');
    if (!context) return;
    const image = context.createImageData(map.size, map.size);
    const peak = Math.max(...map.intensity) || 1;
    for (let j = 0; j < map.size; j++) {
      for (let i = 0; i < map.size; i++) {
        // canvas rows run downwards, the map's y upwards
        const [r, g, b] = shade(map.intensity[j * map.size + i] / peak);
        const o = 4 * ((map.size - 1 - j) * map.size + i);
        image.data[o] = r;
        image.data[o + 1] = g;
        image.data[o + 2] = b;
        image.data[o + 3] = 255;
      }
    }
    context.putImageData(image, 0, 0);
  }, [map]);
  const width = map.step_um * (map.size - 1);
  return (
    <figure className="flex flex-col gap-1">
      <canvas ref={canvas} width={map.size} height={map.size} className="h-48 w-48 rounded border border-hairline [image-rendering:pixelated]" aria-label={label} role="img" />
      <figcaption className="font-mono text-xs text-ink/70">
        {label}: {width.toFixed(2)} µm square at z = {map.z_um.toFixed(1)} µm
      </figcaption>
    </figure>
  );
}
