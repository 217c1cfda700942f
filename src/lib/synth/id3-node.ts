// The ID3 writer under the name the seed and the tracks tests import; it lives in
// ./id3.server.ts, whose .server name keeps SvelteKit from bundling it for the browser.
export { writeId3, type Id3Fields } from './id3.server';
