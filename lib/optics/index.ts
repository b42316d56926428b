/** The optical check: scalar diffraction of the fabricated mask. */
export { simulateMask } from './simulate-mask';
export type {
  AxialScan,
  ChromaticResult,
  FocalMap,
  FocusResult,
  Illumination,
  OrderResult,
  ProgressCallback,
  Sampling,
  SamplingMethod,
  SimulationOptions,
  SimulationResult,
} from './types';
