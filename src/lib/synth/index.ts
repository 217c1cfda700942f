// Browser-safe exports. writeId3 lives in ./id3.node (Node only).
export { generateSong, type Song, type SongOptions } from './song';
export { encodeWav, floatToInt16 } from './wav';
export { encodeMp3 } from './mp3';
