// The tracks feature on the server: list, read, edit, delete, upload and stream.
// (Relative imports, not $lib, so the benchmark script can load this module under tsx.)
export { listTracks, BadCursorError } from './list-tracks';
export {
	getTrack,
	getTrackRow,
	updateTrack,
	deleteTrack,
	type UpdateResult
} from './track-queries';
export { uploadTrack, maxUploadBytes, tooLarge, type UploadResult } from './upload';
export { parseRange, type RangeAnswer } from './byte-range';
export { toTrackJson, type TrackRow } from './track-json';
