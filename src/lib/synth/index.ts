// Browser-safe exports. writeId3 lives in ./id3.server (Node only; SvelteKit keeps *.server.ts
// modules out of the browser bundle).
export { generateSong, type Song, type SongOptions } from './song';
export { encodeWav, floatToInt16 } from './wav';
export { encodeMp3 } from './mp3';
