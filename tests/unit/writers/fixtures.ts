import type { ExposureMatrixSpec } from '@/lib/layout/exposure-matrix';
import type { LayoutLibrary } from '@/lib/layout/types';

/** A hand-built library: a zone layer with a rectangle, a triangle and an L shape, a label, and a placed array. */
export function handBuiltLibrary(): LayoutLibrary {
  return {
    name: 'HANDBUILT',
    databaseUnit: 1e-9,
    userUnit: 1e-6,
    layers: [
      { layer: 1, datatype: 0, name: 'zones', purpose: 'zones' },
      { layer: 10, datatype: 0, name: 'label', purpose: 'label' },
    ],
    cells: [
      {
        name: 'UNIT',
        shapes: [
          {
            layer: 1,
            datatype: 0,
            polygons: [
              Int32Array.from([0, 0, 4000, 0, 4000, 2000, 0, 2000]),
              Int32Array.from([10000, 0, 13000, 0, 11500, 2500]),
              Int32Array.from([20000, 0, 26000, 0, 26000, 1000, 21000, 1000, 21000, 5000, 20000, 5000]),
            ],
          },
          { layer: 10, datatype: 0, polygons: [Int32Array.from([-5000, -5000, -3000, -5000, -3000, -3000])] },
        ],
        texts: [{ layer: 10, texttype: 0, x: 100, y: -200, text: 'unit cell' }],
        placements: [],
      },
      {
        name: 'TOP',
        shapes: [{ layer: 1, datatype: 0, polygons: [Int32Array.from([-100000, -100000, -90000, -100000, -90000, -90000, -100000, -90000])] }],
        texts: [],
        placements: [
          { cell: 'UNIT', x: 0, y: 0 },
          { cell: 'UNIT', x: 50000, y: 0, rotation: 90 },
          { cell: 'UNIT', x: 0, y: 200000, columns: 3, rows: 2, columnStep: { x: 40000, y: 0 }, rowStep: { x: 0, y: 30000 } },
        ],
      },
    ],
    topCell: 'TOP',
  };
}

/** A square of the given side (µm) centred on the origin, as a one-cell library. */
export function squareLibrary(side: number): LayoutLibrary {
  const h = (side * 1000) / 2;
  return {
    name: 'SQUARE',
    databaseUnit: 1e-9,
    userUnit: 1e-6,
    layers: [{ layer: 1, datatype: 0, name: 'zones', purpose: 'zones' }],
    cells: [{ name: 'SQUARE', shapes: [{ layer: 1, datatype: 0, polygons: [Int32Array.from([-h, -h, h, -h, h, h, -h, h])] }], texts: [], placements: [] }],
    topCell: 'SQUARE',
  };
}

/** A label stand-in: one 1 µm box at the baseline start, so counts are easy to check. */
export function boxLabel(_: string, x: number, y: number): Int32Array[] {
  const x0 = Math.round(x * 1000);
  const y0 = Math.round(y * 1000);
  return [Int32Array.from([x0, y0, x0 + 1000, y0, x0 + 1000, y0 + 1000, x0, y0 + 1000])];
}

export function matrixSpec(columns: ExposureMatrixSpec['columns']): ExposureMatrixSpec {
  return {
    name: 'MATRIX',
    columns,
    rows: ['dose 90%', 'dose 100%'],
    gap: 10,
    labelHeight: 5,
    labelLayer: { layer: 10, datatype: 0 },
    labelFor: (c, r) => `${columns[c].caption} ${['dose 90%', 'dose 100%'][r]}`,
    drawLabel: boxLabel,
  };
}

/** The hand-built UNIT cell placed with every transformation and array form the writers have (11 instances, no overlaps). */
export function transformedPlacementsLibrary(): LayoutLibrary {
  const base = handBuiltLibrary();
  const unit = base.cells[0];
  return {
    ...base,
    name: 'PLACEMENTS',
    cells: [
      unit,
      {
        name: 'TOP',
        shapes: [],
        texts: [],
        placements: [
          { cell: 'UNIT', x: -50_000, y: 50_000, rotation: 270, mirrorX: true },
          { cell: 'UNIT', x: 0, y: -100_000, rotation: 180 },
          { cell: 'UNIT', x: 300_000, y: 0, rows: 3, rowStep: { x: 0, y: 20_000 } },
          { cell: 'UNIT', x: 400_000, y: 0, columns: 2, columnStep: { x: 40_000, y: 15_000 } },
          { cell: 'UNIT', x: 500_000, y: -300_000, columns: 2, rows: 2, columnStep: { x: 40_000, y: 5_000 }, rowStep: { x: -5_000, y: 20_000 } },
        ],
      },
    ],
  };
}
