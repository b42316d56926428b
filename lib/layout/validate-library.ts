import type { LayoutLibrary } from './types';

/** Cell and library names that every GDSII and OASIS reader accepts. */
const NAME_PATTERN = /^[A-Za-z0-9_?$.\-]{1,32}$/;
const INT32_MIN = -2147483648;
const INT32_MAX = 2147483647;

/**
 * Checks what both file writers rely on and throws one message listing every problem,
 * so a bad library never produces a half-written file.
 */
export function validateLibrary(library: LayoutLibrary): void {
  const problems: string[] = [];
  if (!NAME_PATTERN.test(library.name)) problems.push(`library name "${library.name}" must be 1–32 characters of A–Z, a–z, 0–9, _ ? $ . -`);
  if (!(library.databaseUnit > 0) || !(library.userUnit > 0)) problems.push('database unit and user unit must be positive lengths in metres');
  const names = new Set<string>();
  for (const cell of library.cells) {
    if (!NAME_PATTERN.test(cell.name)) problems.push(`cell name "${cell.name}" must be 1–32 characters of A–Z, a–z, 0–9, _ ? $ . -`);
    if (names.has(cell.name)) problems.push(`cell "${cell.name}" is defined twice`);
    names.add(cell.name);
  }
  if (!names.has(library.topCell)) problems.push(`top cell "${library.topCell}" is not among the cells`);
  for (const cell of library.cells) {
    for (const shapes of cell.shapes) {
      if (!isLayerNumber(shapes.layer) || !isLayerNumber(shapes.datatype)) {
        problems.push(`cell "${cell.name}": layer ${shapes.layer}/${shapes.datatype} must be integers 0–32767`);
      }
      shapes.polygons.forEach((polygon, index) => {
        if (polygon.length < 6 || polygon.length % 2 !== 0) {
          problems.push(`cell "${cell.name}" layer ${shapes.layer}/${shapes.datatype} polygon ${index}: needs at least 3 points`);
        }
      });
    }
    for (const text of cell.texts) {
      if (!/^[\x20-\x7e]{1,512}$/.test(text.text)) problems.push(`cell "${cell.name}": text "${text.text}" must be 1–512 printable ASCII characters`);
      if (!isCoordinate(text.x) || !isCoordinate(text.y)) problems.push(`cell "${cell.name}": text "${text.text}" position must be 32-bit integers`);
    }
    for (const placement of cell.placements) {
      if (!names.has(placement.cell)) problems.push(`cell "${cell.name}" places unknown cell "${placement.cell}"`);
      if (!isCoordinate(placement.x) || !isCoordinate(placement.y)) problems.push(`cell "${cell.name}": placement of "${placement.cell}" must sit on 32-bit integer coordinates`);
      if ((placement.rotation ?? 0) % 90 !== 0) problems.push(`cell "${cell.name}": placement of "${placement.cell}" rotation ${placement.rotation}° is not a multiple of 90°`);
      const columns = placement.columns ?? 1;
      const rows = placement.rows ?? 1;
      if (!Number.isInteger(columns) || !Number.isInteger(rows) || columns < 1 || rows < 1 || columns > 32767 || rows > 32767) {
        problems.push(`cell "${cell.name}": array of "${placement.cell}" needs 1–32767 columns and rows`);
      }
      if ((columns > 1 && !placement.columnStep) || (rows > 1 && !placement.rowStep)) {
        problems.push(`cell "${cell.name}": array of "${placement.cell}" needs a step for each arrayed direction`);
      }
    }
  }
  const cycle = placementCycle(library);
  if (cycle) problems.push(`cells place each other in a loop: ${cycle.join(' → ')}`);
  if (problems.length > 0) throw new Error(`the layout cannot be written:\n  ${problems.join('\n  ')}`);
}

function isLayerNumber(value: number): boolean {
  return Number.isInteger(value) && value >= 0 && value <= 32767;
}

function isCoordinate(value: number): boolean {
  return Number.isInteger(value) && value >= INT32_MIN && value <= INT32_MAX;
}

/** A chain of cells that places itself, or null (depth-first search over placements). */
function placementCycle(library: LayoutLibrary): string[] | null {
  const children = new Map(library.cells.map((c) => [c.name, [...new Set(c.placements.map((p) => p.cell))]]));
  const state = new Map<string, 'open' | 'done'>();
  const path: string[] = [];
  const visit = (name: string): string[] | null => {
    if (state.get(name) === 'done') return null;
    if (state.get(name) === 'open') return [...path.slice(path.indexOf(name)), name];
    state.set(name, 'open');
    path.push(name);
    for (const child of children.get(name) ?? []) {
      const found = visit(child);
      if (found) return found;
    }
    path.pop();
    state.set(name, 'done');
    return null;
  };
  for (const cell of library.cells) {
    const found = visit(cell.name);
    if (found) return found;
  }
  return null;
}
