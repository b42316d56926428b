import type { CompiledDesign } from '../design/types';
import type { LayoutLibrary } from '../layout/types';
import { buildEngine } from './build-engine';
import type { OpticsEngine } from './engine';
import { imageDistance } from './illumination';
import { readMaskModel } from './mask-model';
import { encircledPower, mapPeak, spotFwhm } from './spot-metrics';
import type { AxialScan, ChromaticResult, FocalMap, FocusResult, Illumination, OrderResult, ProgressCallback, SimulationOptions, SimulationResult } from './types';

/** Orders listed for every designed focus besides the zero order. */
const ORDERS = [-1, 1, 2, 3, 4, 5];
/** Below this an order is reported without a position: there is no focus to find. */
const FAINT_ORDER = 2e-3;
const MAP_SIZE = 41;
/** the map spans ±MAP_AIRY_RADII Airy radii at 8 samples per radius */
const MAP_AIRY_RADII = 2.5;

/**
 * The optical check: scalar diffraction of the mask as fabricated (the layout's polygons, not the ideal
 * phase) under the chosen illumination. Returns foci, orders, axial scans, focal maps and the chromatic
 * focal shift, all JSON-serialisable. Throws an Error with a readable message on inputs it cannot simulate.
 */
export function simulateMask(design: CompiledDesign, library: LayoutLibrary, options: SimulationOptions = {}, onProgress?: ProgressCallback): SimulationResult {
  const progress = onProgress ?? (() => {});
  const illumination: Illumination = options.illumination ?? { kind: 'plane' };
  checkInputs(design, illumination);
  const lambda0 = design.wavelength;
  const k0 = (2 * Math.PI) / lambda0;
  const mask = readMaskModel(design, library);
  const built = buildEngine(design, mask, illumination, options);
  const { engine, axis } = built;
  const warnings = [...built.warnings];
  progress(0.1);

  const equivalentRadius = Math.sqrt(engine.apertureArea / Math.PI);
  const expectedFor = (x: number, y: number, z: number): [number, number, number] => {
    const image = imageDistance(illumination, z);
    if (image === null) return [x, y, z];
    const lateral = illumination.kind === 'point' ? image / illumination.distance_um : 0;
    return [x - (axis.x - x) * lateral, y - (axis.y - y) * lateral, image];
  };
  design.foci.forEach((f, i) => {
    if (imageDistance(illumination, f.z) === null) warnings.push(`focus ${i + 1}: the point source is inside the focal length, so the image is virtual; the designed plane is checked instead`);
  });

  const samples = options.axialSamples ?? (engine.sampling.method === 'radial' ? 600 : 240);
  const axialScans: AxialScan[] = [];
  const foci: FocusResult[] = [];
  const focalMaps: FocalMap[] = [];
  const orders: OrderResult[] = [{ order: 0, focusIndex: null, expectedZ_um: null, z_um: null, efficiency: engine.projectedPower({ x: axis.x, y: axis.y, z: 1, phasePerLength: 0, withIncidentPhase: false }), resolved: true }];
  const { pitch_um, maxSpatialFrequency_per_um } = engine.sampling;
  const resolved = (m: number) => pitch_um === undefined || Math.abs(m) * maxSpatialFrequency_per_um <= 1 / (2 * pitch_um);
  const steps = design.foci.length;

  design.foci.forEach((focus, index) => {
    const expected = expectedFor(focus.x, focus.y, focus.z);
    const [ex, ey, ez] = expected;
    const lo = ez / 6;
    const hi = 1.6 * ez;
    const scan = engine.axialIntensities(ex, ey, lo, (hi - lo) / (samples - 1), samples);
    axialScans.push({ focusIndex: index, x_um: ex, y_um: ey, z_um: Array.from({ length: samples }, (_, i) => lo + ((hi - lo) * i) / (samples - 1)), intensity: Array.from(scan) });

    const na = equivalentRadius / Math.hypot(equivalentRadius, ez);
    const airyRadius = (0.61 * lambda0) / na;
    const peakZ = scanPeak(engine, ex, ey, 0.85 * ez, 1.15 * ez);
    const step = airyRadius / ((MAP_SIZE - 1) / 2 / MAP_AIRY_RADII);
    const map = engine.focalMap(ex, ey, peakZ.z, step, MAP_SIZE);
    const peak = mapPeak(map, MAP_SIZE);
    const half = (MAP_SIZE - 1) / 2;
    const found: [number, number, number] = [ex + (peak.u - half) * step, ey + (peak.v - half) * step, peakZ.z];
    if (peak.atEdge) warnings.push(`focus ${index + 1}: the brightest point lies at the edge of the ±${MAP_AIRY_RADII} Airy-radius window, so the focus is displaced or absent`);
    const fwhm = spotFwhm(map, MAP_SIZE, step, peak);
    focalMaps.push({ focusIndex: index, z_um: peakZ.z, centre_um: [ex, ey], step_um: step, size: MAP_SIZE, intensity: Array.from(map) });
    const ideal = engine.idealPeakIntensity(found[0], found[1], found[2]);
    foci.push({
      designed_um: [focus.x, focus.y, focus.z],
      expected_um: expected,
      found_um: found,
      efficiency: engine.projectedPower({ x: ex, y: ey, z: ez, phasePerLength: k0, withIncidentPhase: true }),
      peakRatio: peak.value / ideal,
      peakIntensity: peak.value,
      fwhm_um: fwhm,
      diffractionLimitFwhm_um: (0.514 * lambda0) / na,
      encircledEnergy: encircledPower(map, MAP_SIZE, step, peak, airyRadius) / engine.incidentPower,
      encircledRadius_um: airyRadius,
    });

    for (const m of ORDERS) {
      const efficiency = engine.projectedPower({ x: focus.x, y: focus.y, z: focus.z, phasePerLength: m * k0, withIncidentPhase: false });
      if (m < 0) {
        orders.push({ order: m, focusIndex: index, expectedZ_um: focus.z / m, z_um: null, efficiency, resolved: resolved(m) });
        continue;
      }
      const [ox, oy, oz] = expectedFor(focus.x, focus.y, focus.z / m);
      const z = m === 1 ? peakZ.z : efficiency < FAINT_ORDER ? null : scanPeak(engine, ox, oy, 0.85 * oz, 1.15 * oz).z;
      orders.push({ order: m, focusIndex: index, expectedZ_um: oz, z_um: z, efficiency, resolved: resolved(m) });
    }
    progress(0.1 + (0.6 * (index + 1)) / steps);
  });

  const chromatic = chromaticShift(design, engine, illumination, options, expectedFor, built.reach, warnings, (f) => progress(0.7 + 0.3 * f));
  progress(1);
  return {
    wavelength_um: lambda0,
    illumination,
    modulation: mask.modulation,
    sampling: engine.sampling,
    aperture: { area_um2: engine.apertureArea, equivalentDiameter_um: 2 * equivalentRadius },
    foci,
    orders,
    axial: axialScans[0],
    axialScans,
    focalMaps,
    chromatic,
    warnings,
  };
}

function checkInputs(design: CompiledDesign, illumination: Illumination): void {
  if (!(design.wavelength > 0) || !Number.isFinite(design.wavelength)) throw new Error('the design wavelength must be a positive length');
  if (design.foci.length === 0) throw new Error('the design declares no focus, so there is nothing to check (line foci, as of an axicon, are not analysed yet)');
  design.foci.forEach((f, i) => {
    if (!(f.z > 0) || !Number.isFinite(f.z)) throw new Error(`focus ${i + 1} must lie behind the mask (z > 0)`);
  });
  if (design.pieces.length === 0) throw new Error('the design has no phase profile');
  if (illumination.kind === 'point' && !(illumination.distance_um > 0)) throw new Error('the point source distance must be a positive length');
}

/** The axial intensity peak in [lo, hi]: a coarse scan, a fine scan around its best point, a parabola. */
function scanPeak(engine: OpticsEngine, x: number, y: number, lo: number, hi: number): { z: number; value: number } {
  const coarse = 32;
  const dz = (hi - lo) / (coarse - 1);
  const first = engine.axialIntensities(x, y, lo, dz, coarse);
  const best = argMax(first);
  const fine = 17;
  const fineLo = lo + (best - 1) * dz;
  const fineDz = (2 * dz) / (fine - 1);
  const second = engine.axialIntensities(x, y, fineLo, fineDz, fine);
  const b = argMax(second);
  let z = fineLo + b * fineDz;
  if (b > 0 && b < fine - 1) {
    const d = second[b - 1] - 2 * second[b] + second[b + 1];
    if (d < 0) z += (0.5 * (second[b - 1] - second[b + 1]) * fineDz) / d;
  }
  return { z, value: second[b] };
}

function argMax(values: Float64Array): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if (values[i] > values[best]) best = i;
  return best;
}

const DEFAULT_BAND_SAMPLES = 7;

function chromaticShift(
  design: CompiledDesign,
  engine: OpticsEngine,
  illumination: Illumination,
  options: SimulationOptions,
  expectedFor: (x: number, y: number, z: number) => [number, number, number],
  reach: (x: number, y: number) => number,
  warnings: string[],
  progress: (fraction: number) => void,
): ChromaticResult {
  const lambda0 = design.wavelength;
  const visible = lambda0 >= 0.38 && lambda0 <= 0.75;
  const band = options.band ?? (visible ? { from_um: 0.42, to_um: 0.68 } : { from_um: 0.9 * lambda0, to_um: 1.1 * lambda0 });
  if (!(band.from_um > 0) || !(band.to_um > band.from_um)) throw new Error('the chromatic band must run from a shorter to a longer positive wavelength');
  const count = Math.max(2, Math.min(41, Math.round(band.samples ?? DEFAULT_BAND_SAMPLES)));
  const focus = design.foci[0];
  const wavelengths = Array.from({ length: count }, (_, i) => band.from_um + ((band.to_um - band.from_um) * i) / (count - 1));
  const found: number[] = [];
  const expected: number[] = [];
  wavelengths.forEach((lambda, i) => {
    engine.setWavelength(lambda);
    // f(λ) = f0·λ0/λ for the first order of a diffractive lens
    const [x, y, z] = expectedFor(focus.x, focus.y, (focus.z * lambda0) / lambda);
    expected.push(z);
    found.push(scanPeak(engine, x, y, 0.8 * z, 1.25 * z).z);
    progress((i + 1) / count);
  });
  const k0 = (2 * Math.PI) / lambda0;
  const zones = (k0 * (Math.hypot(reach(focus.x, focus.y), focus.z) - focus.z)) / Math.PI;
  const maxBandwidth = lambda0 / zones;
  const sourceWidth = band.to_um - band.from_um;
  if (options.band && sourceWidth > maxBandwidth) {
    warnings.push(`the band is ${(sourceWidth * 1000).toFixed(1)} nm wide but ${zones.toFixed(0)} zones keep a sharp focus only within about ${(maxBandwidth * 1000).toFixed(2)} nm (λ/Δλ ≳ number of zones)`);
  }
  return {
    focusIndex: 0,
    wavelength_um: wavelengths,
    focus_z_um: found,
    expected_z_um: expected,
    zones,
    maxBandwidth_um: maxBandwidth,
    note: `${zones.toFixed(0)} Fresnel zones: the focus stays sharp while λ/Δλ ≳ ${zones.toFixed(0)}, a band of about ${(maxBandwidth * 1000).toFixed(2)} nm at ${(lambda0 * 1000).toFixed(0)} nm; wider sources smear the focus along the axis, red nearer the mask, blue farther`,
  };
}
