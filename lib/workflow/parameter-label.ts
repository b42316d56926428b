/**
 * Words for a flattened parameter path ("foci[1].z" → "Focus 2 · z (µm)"), so the Compare tables read
 * as the design's own terms. Known names come from the table below; any other key is split at its
 * capitals, so a new field still reads sensibly before it is added here.
 */

/** Names of keys as the tables show them (the label's first letter is capitalised); `item` names one element of an array key. */
const NAMES: Record<string, { name: string; item?: string }> = {
  foci: { name: 'foci', item: 'focus' },
  layerMap: { name: 'layer map', item: 'layer-map row' },
  processProfile: { name: 'process' },
  process: { name: 'process' },
  settings: { name: 'export' },
  report: { name: 'report' },
  quantization: { name: 'quantization' },
  engineVersion: { name: 'engine version' },
  wavelength_um: { name: 'wavelength (µm)' },
  x: { name: 'x (µm)' },
  y: { name: 'y (µm)' },
  z: { name: 'z (µm)' },
  weight: { name: 'weight' },
  duty: { name: 'duty cycle' },
  phaseOffset: { name: 'phase offset (rad)' },
  refractiveIndex: { name: 'refractive index' },
  bits: { name: 'masks (bits)' },
  minimumFeature: { name: 'minimum feature (µm)' },
  databaseUnit: { name: 'database unit (µm)' },
  chordTolerance: { name: 'chord tolerance (µm)' },
  chordToleranceMicrometres: { name: 'chord tolerance (µm)' },
  minimumFeatureMicrometres: { name: 'minimum feature (µm)' },
  maxVerticesPerPolygon: { name: 'vertex cap per polygon' },
  processNotes: { name: 'notes' },
  levelIndex: { name: 'mask index' },
};

/** "maxVerticesPerPolygon" → "max vertices per polygon"; "_um" becomes a unit. */
function words(key: string): string {
  const unit = key.endsWith('_um') ? ' (µm)' : '';
  const base = unit ? key.slice(0, -3) : key;
  return base.replace(/([a-z0-9])([A-Z])/g, '$1 $2').replace(/_/g, ' ').toLowerCase() + unit;
}

export function parameterLabel(path: string): string {
  const parts: string[] = [];
  let owner = '';
  // keys and indices in order: "foci[1].z" → foci, [1], z; an index names one item of the key before it
  for (const [, key, index] of path.matchAll(/([^.[\]]+)|\[(\d+)\]/g)) {
    if (index !== undefined) {
      const whole = parts.pop() ?? '';
      parts.push(`${NAMES[owner]?.item ?? whole} ${Number(index) + 1}`);
    } else {
      owner = key;
      parts.push(NAMES[key]?.name ?? words(key));
    }
  }
  const label = parts.join(' · ');
  return label.charAt(0).toUpperCase() + label.slice(1);
}
