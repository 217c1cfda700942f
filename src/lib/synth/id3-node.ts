// Kept for imports written before the rename; new code imports ./id3.server (tsx reads a
// ".node" import as a native addon, so scripts cannot use this name).
export { writeId3, type Id3Fields } from './id3.server';
