/**
 * The highest value of f on [lo, hi]: a scan of `samples` points, then golden-section refinement
 * between the best sample's neighbours. Returns the position and value.
 */
export function findPeak(f: (x: number) => number, lo: number, hi: number, samples: number): { x: number; value: number } {
  const step = (hi - lo) / (samples - 1);
  let best = 0;
  let bestValue = -Infinity;
  for (let i = 0; i < samples; i++) {
    const v = f(lo + i * step);
    if (v > bestValue) {
      bestValue = v;
      best = i;
    }
  }
  let a = lo + Math.max(0, best - 1) * step;
  let b = lo + Math.min(samples - 1, best + 1) * step;
  const ratio = (Math.sqrt(5) - 1) / 2;
  let c = b - ratio * (b - a);
  let d = a + ratio * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let i = 0; i < 30 && b - a > 1e-9 * Math.max(1, Math.abs(b)); i++) {
    if (fc > fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - ratio * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + ratio * (b - a);
      fd = f(d);
    }
  }
  const x = fc > fd ? c : d;
  const value = Math.max(fc, fd);
  return value >= bestValue ? { x, value } : { x: lo + best * step, value: bestValue };
}

/** Full width at half maximum of a profile sampled at spacing `step` from its peak at index 0 outwards. */
export function halfWidthFromCentre(profile: ArrayLike<number>, step: number): number | null {
  const half = profile[0] / 2;
  for (let i = 1; i < profile.length; i++) {
    if (profile[i] <= half) {
      const fraction = (profile[i - 1] - half) / (profile[i - 1] - profile[i]);
      return 2 * step * (i - 1 + fraction);
    }
  }
  return null;
}
