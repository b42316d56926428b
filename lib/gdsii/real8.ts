/**
 * GDSII 8-byte real (GDSII Stream Format Manual, release 6.0, "Data types"): one sign bit,
 * a 7-bit base-16 exponent in excess-64 notation and a 56-bit mantissa m with
 * value = (−1)^sign · (m / 2^56) · 16^(exponent − 64), the mantissa normalised to [1/16, 1).
 */
export function encodeReal8(value: number): Uint8Array {
  const out = new Uint8Array(8);
  if (value === 0) return out;
  if (!Number.isFinite(value)) throw new Error(`GDSII real: ${value} cannot be written`);
  const sign = value < 0 ? 0x80 : 0;
  let magnitude = Math.abs(value);
  let exponent = 0;
  while (magnitude >= 1) {
    magnitude /= 16;
    exponent += 1;
  }
  while (magnitude < 1 / 16) {
    magnitude *= 16;
    exponent -= 1;
  }
  if (exponent + 64 < 0 || exponent + 64 > 127) throw new Error(`GDSII real: ${value} is out of range`);
  // magnitude in [1/16, 1) carries 53 significant bits, all at or above 2^−56: the scaled value is an exact integer.
  let mantissa = BigInt(magnitude * 2 ** 56);
  out[0] = sign | (exponent + 64);
  for (let i = 7; i >= 1; i--) {
    out[i] = Number(mantissa & 0xffn);
    mantissa >>= 8n;
  }
  return out;
}

export function decodeReal8(bytes: Uint8Array, offset = 0): number {
  const sign = bytes[offset] & 0x80 ? -1 : 1;
  const exponent = (bytes[offset] & 0x7f) - 64;
  let mantissa = 0;
  for (let i = 1; i < 8; i++) mantissa = mantissa * 256 + bytes[offset + i];
  return sign * (mantissa / 2 ** 56) * 16 ** exponent;
}
