import type { AxialScan, ChromaticResult, FocalMap } from '@/lib/optics';
import { toCsv } from './csv';

/** The CSV files the focus check offers, one per curve or map. */
export function axialCsv(scan: AxialScan): string {
  return toCsv(['z_um', 'intensity_relative_to_incident'], scan.z_um.map((z, i) => [z, scan.intensity[i]]));
}

export function chromaticCsv(c: ChromaticResult): string {
  return toCsv(['wavelength_um', 'focus_z_um', 'f0_lambda0_over_lambda_um'], c.wavelength_um.map((l, i) => [l, c.focus_z_um[i], c.expected_z_um[i]]));
}

export function focalMapCsv(map: FocalMap): string {
  const half = (map.size - 1) / 2;
  const rows: number[][] = [];
  for (let j = 0; j < map.size; j++) {
    for (let i = 0; i < map.size; i++) {
      rows.push([map.centre_um[0] + (i - half) * map.step_um, map.centre_um[1] + (j - half) * map.step_um, map.intensity[j * map.size + i]]);
    }
  }
  return toCsv(['x_um', 'y_um', 'intensity_relative_to_incident'], rows);
}
