'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Notice } from '@/components/ui';
import { apiJson, errorText } from '@/components/review/api';
import type { GeometryDifference } from '@/lib/workflow/geometry-difference';
import { formatArea } from './format';
import { XorOverlay } from './XorOverlay';

/** Per-layer XOR of the two released masks (computed by the server from the stored bundles) and the overlay. */
export function GeometryPanel({ a, b }: { a: string; b: string }) {
  const [layerKey, setLayerKey] = useState<string>('all');
  const query = useQuery({
    queryKey: ['compare-geometry', a, b],
    queryFn: () => apiJson<GeometryDifference>(`/api/compare?a=${encodeURIComponent(a)}&b=${encodeURIComponent(b)}`),
    staleTime: Infinity, // revisions are immutable
    retry: false,
  });
  if (query.isPending) return <p className="text-sm text-ink/60">Reading both bundles and computing the XOR of every layer…</p>;
  if (query.isError) return <Notice tone="error">{errorText(query.error)}</Notice>;
  const d = query.data;
  const total = d.layers.reduce((sum, l) => sum + l.addedArea + l.removedArea, 0);
  return (
    <div className="flex flex-col gap-3">
      <table className="w-full border-collapse text-sm" data-testid="xor-table">
        <thead>
          <tr className="text-left text-xs text-ink/70">
            <th className="py-1 pr-4 font-medium">layer/datatype</th>
            <th className="py-1 pr-4 text-right font-medium">area added</th>
            <th className="py-1 pr-4 text-right font-medium">area removed</th>
            <th className="py-1 text-right font-medium">changed regions</th>
          </tr>
        </thead>
        <tbody>
          {d.layers.map((l) => {
            const key = `${l.layer}/${l.datatype}`;
            return (
              <tr key={key} className="border-t border-hairline" data-layer={key}>
                <td className="py-1 pr-4">
                  <button
                    type="button"
                    className={`font-mono text-xs underline-offset-2 hover:underline ${layerKey === key ? 'font-semibold' : ''}`}
                    aria-pressed={layerKey === key}
                    onClick={() => setLayerKey(layerKey === key ? 'all' : key)}
                  >
                    {l.name}
                  </button>
                </td>
                <td className="py-1 pr-4 text-right font-mono text-xs text-added" data-testid="added-area">{formatArea(l.addedArea)}</td>
                <td className="py-1 pr-4 text-right font-mono text-xs text-removed" data-testid="removed-area">{formatArea(l.removedArea)}</td>
                <td className="py-1 text-right font-mono text-xs">{(l.addedPolygons + l.removedPolygons).toLocaleString('en')}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      {total === 0 ? (
        <Notice tone="success">The two masks are identical on every layer.</Notice>
      ) : (
        <>
          {d.truncated ? (
            <p className="text-xs text-warning">
              So many regions changed that the overlay draws an even sample of them ({d.shownVertices.toLocaleString('en')} vertices); the areas above count all of them.
            </p>
          ) : null}
          <p className="text-xs text-ink/70">{layerKey === 'all' ? 'Showing every layer; pick one in the table to show it alone.' : `Showing layer ${layerKey} only.`}</p>
          <XorOverlay difference={d} layerKey={layerKey} />
        </>
      )}
    </div>
  );
}
