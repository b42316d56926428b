/** A round scale-bar length (1, 2 or 5 × 10^k µm) close to a fifth of the drawing width, and its label. */
export function scaleBar(widthMicrometres: number): { length: number; label: string } {
  const target = widthMicrometres / 5;
  const power = 10 ** Math.floor(Math.log10(target));
  const step = [5, 2, 1].find((m) => m * power <= target) ?? 1;
  const length = step * power;
  if (length >= 1000) return { length, label: `${trim(length / 1000)} mm` };
  if (length >= 1) return { length, label: `${trim(length)} µm` };
  return { length, label: `${trim(length * 1000)} nm` };
}

function trim(value: number): string {
  return String(Number(value.toPrecision(6)));
}
