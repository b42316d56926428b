/**
 * Relative step between two equal weights. Two waves of equal weight cancel along whole lines
 * (wherever their phases differ by π): u = 0 there, arg u jumps by π across them and the zone
 * boundaries cross in X-shaped junctions, which no contour follower can take consistently. With the
 * second weight lower by this fraction, u vanishes nowhere (|u| ≥ 1e-4·w), each junction opens into
 * two boundaries passing at a distance of about 1e-4/|∇(φ1 − φ2)/2| (0.1 nm where the two phases'
 * gradients differ by 2 rad/µm), and elsewhere no edge moves by more than that: far below the
 * database grid, so the mask is the equal-weight mask on the grid.
 */
export const EQUAL_WEIGHT_STEP = 1e-4;

/**
 * The weights a combination is drawn with: the user's, except that when exactly two waves carry
 * light and their weights agree to within EQUAL_WEIGHT_STEP, the second is taken that much lower.
 * Three or more waves cancel only at isolated points, which the mask geometry handles.
 */
export function distinctWeights(weights: readonly number[]): Float64Array {
  const out = Float64Array.from(weights);
  const lit = weights.flatMap((w, i) => (w > 0 ? [i] : []));
  if (lit.length !== 2) return out;
  const [a, b] = lit;
  if (Math.abs(out[a] - out[b]) <= EQUAL_WEIGHT_STEP * Math.max(out[a], out[b])) out[b] = out[a] * (1 - EQUAL_WEIGHT_STEP);
  return out;
}
