export { oasisChunks, writeOasis, type OasisOptions } from './write-oasis';
