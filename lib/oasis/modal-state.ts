/**
 * The modal variables a writer tracks within one cell (SEMI P39, modal variables): a field equal to
 * its modal value is left out of the record. All are undefined again at every CELL record.
 */
export interface ModalState {
  layer?: number;
  datatype?: number;
  geometryX: number;
  geometryY: number;
  placementX: number;
  placementY: number;
  textLayer?: number;
  textType?: number;
  textX: number;
  textY: number;
}

/** At the start of a cell, with xy-mode absolute, positions start from 0. */
export function freshModalState(): ModalState {
  return { geometryX: 0, geometryY: 0, placementX: 0, placementY: 0, textX: 0, textY: 0 };
}
