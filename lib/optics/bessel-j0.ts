/**
 * Bessel function J0(x): the power series (Abramowitz & Stegun 9.1.10) below x = 12 and the Hankel
 * asymptotic expansion (A&S 9.2.5, 9.2.9, 9.2.10) above, both summed until their terms stop mattering.
 */
export function besselJ0(x: number): number {
  const ax = Math.abs(x);
  if (ax < 12) {
    const q = -(ax * ax) / 4;
    let term = 1;
    let sum = 1;
    for (let k = 1; k < 80; k++) {
      term *= q / (k * k);
      sum += term;
      if (Math.abs(term) < 1e-17 * Math.abs(sum) + 1e-300) break;
    }
    return sum;
  }
  // P and Q of the Hankel expansion with μ = 4ν² = 0: a_k = Π (−(2j−1)²) / (k!·(8x)^k)
  let p = 1;
  let q = 0;
  let a = 1;
  for (let k = 1; k < 40; k++) {
    const next = (a * -((2 * k - 1) ** 2)) / (k * 8 * ax);
    if (Math.abs(next) > Math.abs(a)) break;
    a = next;
    // terms alternate between Q (odd k) and P (even k) with signs (−1)^⌊k/2⌋
    const signed = Math.floor(k / 2) % 2 === 0 ? a : -a;
    if (k % 2 === 1) q += signed;
    else p += signed;
    if (Math.abs(a) < 1e-17) break;
  }
  const chi = ax - Math.PI / 4;
  return Math.sqrt(2 / (Math.PI * ax)) * (p * Math.cos(chi) - q * Math.sin(chi));
}
