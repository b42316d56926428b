import { PHASE_MAP_LIMITS } from './limits';
import type { PhaseMapPlacement, PhaseMapResult } from './placement';
import { placeGrid } from './placement';

export interface CsvPhaseOptions extends PhaseMapPlacement {
  /** unit of the numbers in the file */
  unit: 'rad' | 'waves' | 'deg';
}

const TO_RADIANS = { rad: 1, waves: 2 * Math.PI, deg: Math.PI / 180 } as const;

/**
 * Parses a phase map written as a grid of numbers: one row per line, values separated by
 * commas, semicolons, tabs or spaces; blank lines and lines starting with # are skipped.
 * The first line is the top of the map.
 */
export function parsePhaseCsv(text: string, options: CsvPhaseOptions): PhaseMapResult {
  if (text.length > PHASE_MAP_LIMITS.maxFileBytes) return { ok: false, error: `the file is larger than ${PHASE_MAP_LIMITS.maxFileBytes / 1024 / 1024} MB` };
  const factor = TO_RADIANS[options.unit];
  if (factor === undefined) return { ok: false, error: 'the unit must be rad, waves or deg' };
  const rows: number[][] = [];
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  for (let n = 0; n < lines.length; n++) {
    const line = lines[n].trim();
    if (line === '' || line.startsWith('#')) continue;
    if (rows.length >= PHASE_MAP_LIMITS.maxRows) return { ok: false, error: `more than ${PHASE_MAP_LIMITS.maxRows} rows` };
    const cells = line.split(/\s*[,;\t]\s*|\s+/);
    const row: number[] = [];
    for (let c = 0; c < cells.length; c++) {
      const v = cells[c] === '' ? NaN : Number(cells[c]);
      if (!Number.isFinite(v)) return { ok: false, error: `line ${n + 1}, value ${c + 1}: "${cells[c].slice(0, 20)}" is not a number` };
      row.push(v * factor);
    }
    if (rows.length > 0 && row.length !== rows[0].length) {
      return { ok: false, error: `line ${n + 1} has ${row.length} values but the first row has ${rows[0].length}; every row needs the same count` };
    }
    rows.push(row);
  }
  if (rows.length === 0) return { ok: false, error: 'the file holds no numbers' };
  return placeGrid(rows[0].length, rows.length, (i, fileRow) => rows[fileRow][i], options);
}
