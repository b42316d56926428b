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
