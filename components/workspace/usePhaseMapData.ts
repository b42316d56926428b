'use client';

import { useQuery } from '@tanstack/react-query';
import type { PhaseMapRecord } from '@/lib/jobs/export-job';
import { ApiFailure } from './api';
import type { PhaseMapRow } from './types';

const NONE: PhaseMapRecord[] = [];

/** The raw files of the design's phase maps, so the preview compiles with the same data as the export. */
export function usePhaseMapData(designId: string, maps: PhaseMapRow[]): PhaseMapRecord[] {
  const query = useQuery({
    queryKey: ['phase-map-data', designId, maps.map((m) => m.id).join(',')],
    enabled: maps.length > 0,
    staleTime: Infinity,
    queryFn: () =>
      Promise.all(
        maps.map(async (m): Promise<PhaseMapRecord> => {
          const response = await fetch(`/api/designs/${designId}/phase-maps/${m.id}`);
          if (!response.ok) throw new ApiFailure(response.status, `Phase map “${m.name}” could not be loaded for the preview.`);
          return { name: m.name, format: m.format, pitch: m.pitch, phaseScale: m.phaseScale, data: new Uint8Array(await response.arrayBuffer()) };
        }),
      ),
  });
  return query.data ?? NONE;
}
