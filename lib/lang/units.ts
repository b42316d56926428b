/**
 * Units the language accepts after a number, as data. `factor` converts to the internal unit
 * (µm for lengths, rad for angles and phases); `length` and `angle` are the dimension exponents.
 */
export interface UnitInfo {
  name: string;
  factor: number;
  length: number;
  angle: number;
  description: string;
}

export const UNITS: readonly UnitInfo[] = [
  { name: 'nm', factor: 1e-3, length: 1, angle: 0, description: 'nanometre' },
  { name: 'um', factor: 1, length: 1, angle: 0, description: 'micrometre (also written µm)' },
  { name: 'µm', factor: 1, length: 1, angle: 0, description: 'micrometre' },
  { name: 'μm', factor: 1, length: 1, angle: 0, description: 'micrometre (Greek mu)' },
  { name: 'mm', factor: 1e3, length: 1, angle: 0, description: 'millimetre' },
  { name: 'cm', factor: 1e4, length: 1, angle: 0, description: 'centimetre' },
  { name: 'm', factor: 1e6, length: 1, angle: 0, description: 'metre' },
  { name: 'rad', factor: 1, length: 0, angle: 1, description: 'radian (angle or phase)' },
  { name: 'mrad', factor: 1e-3, length: 0, angle: 1, description: 'milliradian' },
  { name: 'deg', factor: Math.PI / 180, length: 0, angle: 1, description: 'degree' },
  { name: 'waves', factor: 2 * Math.PI, length: 0, angle: 1, description: 'phase in waves (1 waves = 2π rad)' },
];

export function findUnit(name: string): UnitInfo | undefined {
  return UNITS.find((u) => u.name === name);
}
