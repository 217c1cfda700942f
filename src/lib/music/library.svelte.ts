// The music table's rows, held in the browser. All tracks are loaded (500 a page) rather than
// paged from the server: a club's library is at most some thousands of tracks (the issue's
// target is 10,000, about 5 MB of JSON), and with every row in hand sorting, filtering and
// searching are instant in the table and need no round trip. Only the dance and verdict
// filters ask the server, because fits are not part of a track's row.
import { fetchAllTracks } from './tracks-client';

export { suitingTracks, trackIdsFor, type FitWord } from './tracks-client';
import type { TrackJson } from './track-types';

export class TrackLibrary {
	tracks = $state.raw<TrackJson[]>([]);
	loaded = $state(0);
	total = $state<number | null>(null);
	loading = $state(false);
	error = $state<string | null>(null);

	async load() {
		this.loading = true;
		this.error = null;
		try {
			const rows: TrackJson[] = [];
			await fetchAllTracks({}, (items, total) => {
				rows.push(...items);
				this.loaded = rows.length;
				this.total = total;
			});
			this.tracks = rows;
		} catch (e) {
			this.error = e instanceof Error ? e.message : String(e);
		} finally {
			this.loading = false;
		}
	}

	/** Adds a new track or replaces the one with the same id (new arrays: rows are raw state). */
	upsert(track: TrackJson) {
		const at = this.tracks.findIndex((t) => t.id === track.id);
		this.tracks =
			at === -1 ? [...this.tracks, track] : this.tracks.map((t) => (t.id === track.id ? track : t));
	}
}
