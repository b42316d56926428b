/** Turns stored phase-map uploads into the PhaseMaps the compiler samples, by name. */
import { parsePhaseCsv, parsePhasePng, type PhaseMap, type PhaseMapResult } from '../phasemap';
import type { PhaseMapRecord } from './export-job';

export interface PhaseMapUpload {
  format: 'png16' | 'csv';
  /** µm */
  pitch: number;
  /** radians per unit of a CSV value, or radians of the full 16-bit scale of a PNG */
  phaseScale: number;
  data: Uint8Array;
}

/** Parses one upload: a CSV read in radians and scaled by phaseScale, or a PNG with phaseScale as its full range. */
export function decodePhaseMap(upload: PhaseMapUpload): PhaseMapResult {
  if (upload.format === 'png16') return parsePhasePng(upload.data, { pitchX: upload.pitch, phaseRange: upload.phaseScale });
  const parsed = parsePhaseCsv(new TextDecoder('utf-8', { fatal: false }).decode(upload.data), { pitchX: upload.pitch, unit: 'rad' });
  if (!parsed.ok) return parsed;
  const values = parsed.map.values.map((v) => v * upload.phaseScale);
  return { ok: true, map: { ...parsed.map, values } };
}

/** A lookup for the compiler's env.phaseMaps; each map is parsed the first time the script asks for it. */
export function phaseMapLookup(records: PhaseMapRecord[]): (name: string) => PhaseMap | undefined {
  const cache = new Map<string, PhaseMap | undefined>();
  return (name) => {
    if (!cache.has(name)) {
      const record = records.find((r) => r.name === name);
      const decoded = record ? decodePhaseMap(record) : null;
      cache.set(name, decoded?.ok ? decoded.map : undefined);
    }
    return cache.get(name);
  };
}
