/**
 * The export the worker runs for a revision (in the export thread): the bundle from lib/export, the
 * optical check of the same mask from lib/optics, and the figures the history table shows.
 */
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { ExportError, exportDesign } from '../export';
import { buildMask } from '../geometry';
import { simulateMask } from '../optics';
import { processProfileSchema, DEFAULT_PROCESS_PROFILE } from '../schemas/designs';
import { ExportRefused, type Exporter } from './export-job';
import { maskFigures } from './mask-figures';
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
      font: new Uint8Array(readFileSync(FONT_PATH)),
      phaseMaps,
      onProgress: (fraction, stage) => onProgress(0.8 * fraction, stage),
    });
  } catch (error) {
    if (error instanceof ExportError) throw new ExportRefused(error.message);
    throw error;
  }

  onProgress(0.82, 'focus check');
  const focusCheck = runFocusCheck(result.design, profile, (f) => onProgress(0.82 + 0.17 * f, 'focus check'));
  const figures = maskFigures(result.report);
  return {
    zip: result.zip,
    sha256: result.sha256,
    manifest: result.manifest as unknown as Record<string, unknown>,
    report: { mask: result.report, summary: result.summary, focusCheck },
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

/**
 * The optical check samples the mask on pixels of a few tenths of a µm, so chords finer than this
 * change nothing it can see; building its mask at this tolerance saves most of the geometry time.
 */
const FOCUS_CHECK_CHORD_UM = 0.05;

/**
 * The optical check of the mask as drawn. The export result carries no layout, so the mask is built
 * again (see FOCUS_CHECK_CHORD_UM); a check that cannot run is stored as its reason, never failing the export.
 */
function runFocusCheck(
  design: Parameters<typeof simulateMask>[0],
  profile: { chordTolerance: number; databaseUnit: number; minimumFeature: number },
  onProgress: (fraction: number) => void,
): { result: unknown; chordTolerance_um: number } | { error: string } {
  try {
    const { library } = buildMask(design, {
      databaseUnit: profile.databaseUnit * 1e-6,
      userUnit: 1e-6,
      chordTolerance: Math.max(profile.chordTolerance, FOCUS_CHECK_CHORD_UM),
      minimumFeature: profile.minimumFeature,
      name: 'FOCUSCHECK',
    });
    return { result: simulateMask(design, library, {}, onProgress), chordTolerance_um: Math.max(profile.chordTolerance, FOCUS_CHECK_CHORD_UM) };
  } catch (error) {
    return { error: error instanceof Error ? error.message : String(error) };
  }
}
