/**
 * The export the worker runs for a revision (in a worker thread): the bundle from lib/export and the
 * figures the history table shows. The focus check follows as its own job (focus-job.ts).
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { ExportError, exportDesign } from '../export';
import { processProfileSchema, DEFAULT_PROCESS_PROFILE } from '../schemas/designs';
import { ExportRefused, type Exporter } from './export-job';
import { maskFigures } from './mask-figures';
import { maskLayersFromLayerMap } from './mask-layers';
import { phaseMapLookup } from './phase-maps';

const FONT_PATH = path.join(__dirname, '..', '..', 'fonts', 'jetbrains-mono-latin-400-normal.woff');

/** Printable ASCII for the library and manifest names (the GDSII and OASIS name rules). */
function asciiName(name: string): string {
  const plain = name.normalize('NFKD').replace(/[^\x20-\x7e]+/g, ' ').replace(/\s+/g, ' ').trim();
  return (plain || 'design').slice(0, 120);
}

export const exportRevision: Exporter = async (input, onProgress) => {
  const parsed = processProfileSchema.safeParse({ ...DEFAULT_PROCESS_PROFILE, ...input.processProfile });
  if (!parsed.success) throw new ExportRefused(`The process profile has problems: ${parsed.error.issues.map((i) => i.message).join(' ')}`);
  const profile = parsed.data;
  const phaseMaps = phaseMapLookup(input.phaseMaps);
  let result;
  try {
    result = await exportDesign(input.source, {
      designName: asciiName(input.designName),
      designId: input.designId,
      revision: input.revisionNumber,
      revisionId: input.revisionId,
      // The revision's own save time, so exporting it again gives the same bytes.
      timestamp: new Date(input.savedAt),
      chordTolerance: profile.chordTolerance,
      databaseUnit: profile.databaseUnit,
      minimumFeature: profile.minimumFeature,
      layers: maskLayersFromLayerMap(profile.layerMap),
      font: new Uint8Array(readFileSync(FONT_PATH)),
      phaseMaps,
      onProgress,
    });
  } catch (error) {
    if (error instanceof ExportError) throw new ExportRefused(error.message);
    throw error;
  }

  const figures = maskFigures(result.report);
  return {
    zip: result.zip,
    sha256: result.sha256,
    manifest: result.manifest as unknown as Record<string, unknown>,
    report: { mask: result.report, summary: result.summary },
    parameters: {
      processProfile: profile,
      settings: result.manifest.settings,
      engineVersion: result.manifest.engineVersion,
      wavelength_um: result.design.wavelength,
      quantization: result.design.quantization,
      foci: result.design.foci,
    },
    zoneCount: figures.zoneCount,
    narrowestFeature: figures.narrowest?.width ?? null,
  };
};
