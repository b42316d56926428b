export { gdsiiChunks, writeGdsii, type GdsiiOptions } from './write-gdsii';
export { readGdsii } from './read-gdsii';
export { encodeReal8, decodeReal8 } from './real8';
