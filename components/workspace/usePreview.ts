'use client';

import { useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import type { ProcessProfile } from '@/lib/schemas/designs';
import { callApi, sendJson } from './api';
import type { PreviewResponse } from './preview-types';

const DEBOUNCE_MS = 600;

/** The live preview of the working script, fetched a moment after typing stops; the last good mask stays shown meanwhile. */
export function usePreview(designId: string, script: string, profile: ProcessProfile) {
  const [settled, setSettled] = useState(script);
  useEffect(() => {
    const t = setTimeout(() => setSettled(script), DEBOUNCE_MS);
    return () => clearTimeout(t);
  }, [script]);
  return useQuery({
    queryKey: ['preview', designId, settled, profile],
    queryFn: ({ signal }) =>
      callApi<PreviewResponse>(`/api/designs/${designId}/preview`, { ...sendJson('POST', { script: settled, processProfile: profile }), signal }),
    placeholderData: (previous) => previous,
    staleTime: Infinity,
    retry: false,
  });
}

export type Preview = ReturnType<typeof usePreview>;
