/**
 * The focus check of a saved revision (run in a worker thread by the focus-check job): compile the
 * saved script again (a compiled design holds functions, so it cannot travel between threads), build
 * its mask, and simulate it with lib/optics. A check that cannot run returns its reason.
 */
import { buildMask } from '../geometry';
import { compileScript } from '../lang';
import { simulateMask } from '../optics';
import { DEFAULT_PROCESS_PROFILE, processProfileSchema } from '../schemas/designs';
import type { ProgressReporter } from './export-job';
import type { FocusInput, FocusOutcome } from './focus-job';
import { phaseMapLookup } from './phase-maps';

/**
 * The optical check samples the mask on pixels of a few tenths of a µm, so chords finer than this
 * change nothing it can see; building its mask at this tolerance saves geometry time.
 */
const FOCUS_CHECK_CHORD_UM = 0.05;

export async function focusCheckRevision(input: FocusInput, onProgress: ProgressReporter): Promise<FocusOutcome> {
  const profile = processProfileSchema.safeParse({ ...DEFAULT_PROCESS_PROFILE, ...input.processProfile });
  if (!profile.success) return { error: 'the process profile is not valid' };
  const compiled = compileScript(input.source, { phaseMaps: phaseMapLookup(input.phaseMaps) });
  if (!compiled.ok) return { error: 'the script does not compile' };
  const chordTolerance = Math.max(profile.data.chordTolerance, FOCUS_CHECK_CHORD_UM);
  try {
    onProgress(0, 'mask geometry');
    const { library } = buildMask(compiled.design, {
      databaseUnit: profile.data.databaseUnit * 1e-6,
      userUnit: 1e-6,
      chordTolerance,
      minimumFeature: profile.data.minimumFeature,
      name: 'FOCUSCHECK',
    });
    const result = simulateMask(compiled.design, library, {}, (f) => onProgress(0.3 + 0.7 * f, 'simulation'));
    return { result, chordTolerance_um: chordTolerance };
  } catch (error) {
    return { error: error instanceof Error ? error.message : String(error) };
  }
}
