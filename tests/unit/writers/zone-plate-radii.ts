/**
 * Open zones of an on-axis binary zone plate with duty 0.5 centred on phase 0: open where the path to
 * the focus exceeds f by mλ ± λ/4; a path f + Δ reaches the radius r = √((f + Δ)² − f²) (Pythagoras;
 * the Fresnel zone plate radii). Zones are cut at the aperture radius. Lengths in µm.
 */
export function openZones(wavelength: number, focal: number, aperture: number): Array<{ inner: number; outer: number }> {
  const radius = (excess: number) => Math.sqrt((focal + excess) ** 2 - focal ** 2);
  const zones: Array<{ inner: number; outer: number }> = [];
  for (let m = 0; ; m++) {
    const inner = m === 0 ? 0 : radius((m - 0.25) * wavelength);
    if (inner >= aperture) return zones;
    zones.push({ inner, outer: Math.min(radius((m + 0.25) * wavelength), aperture) });
  }
}
