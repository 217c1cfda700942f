// The batch of dropped files: each is analysed in the browser, then uploaded with its analysis,
// a few at a time so the page stays responsive. Progress per file and for the batch, time
// left, and Cancel (queued files are dropped, files in flight are aborted).
import type { FileAnalysis } from '../tempo/analyse-browser';
import type { TrackJson } from './track-types';

export type ItemState =
	'queued' | 'analysing' | 'uploading' | 'stored' | 'duplicate' | 'failed' | 'cancelled';

export interface QueueItem {
	key: number;
	name: string;
	size: number;
	state: ItemState;
	/** 0–1 while uploading; null while analysing (the analysis reports no steps). */
	progress: number | null;
	message: string;
	bpm: number | null;
	confidence: number | null;
	track: TrackJson | null;
}

export interface UploadAnswer {
	status: number;
	body: { track?: TrackJson; duplicate?: boolean; error?: string };
}

export interface QueueDeps {
	analyse: (file: File, signal: AbortSignal) => Promise<FileAnalysis>;
	upload: (
		form: FormData,
		onProgress: (fraction: number) => void,
		signal: AbortSignal
	) => Promise<UploadAnswer>;
	onTrack: (track: TrackJson) => void;
	concurrency?: number;
}

const FINISHED: ItemState[] = ['stored', 'duplicate', 'failed', 'cancelled'];

export class UploadQueue {
	items = $state<QueueItem[]>([]);
	// Bookkeeping, not shown: plain Maps on purpose (nothing renders from them).
	// eslint-disable-next-line svelte/prefer-svelte-reactivity
	private files = new Map<number, File>();
	// eslint-disable-next-line svelte/prefer-svelte-reactivity
	private controllers = new Map<number, AbortController>();
	private nextKey = 1;
	private running = 0;
	private batchStart = 0;
	private batchFrom = 0;
	private now = $state(0);
	private readonly deps: QueueDeps;

	constructor(deps: QueueDeps) {
		this.deps = deps;
	}

	/** The files of the current batch (everything since the queue was last idle). */
	get batch(): QueueItem[] {
		return this.items.slice(this.batchFrom);
	}
	get total() {
		return this.batch.length;
	}
	get done() {
		return this.batch.filter((i) => FINISHED.includes(i.state)).length;
	}
	get busy() {
		return this.done < this.total;
	}
	/** Seconds left, from the pace so far; null until one file has finished. */
	get secondsLeft(): number | null {
		const done = this.done;
		if (done === 0 || !this.busy) return null;
		const elapsed = (this.now - this.batchStart) / 1000;
		return Math.max(0, Math.round((elapsed / done) * (this.total - done)));
	}

	add(files: Iterable<File>) {
		if (!this.busy) {
			this.batchFrom = this.items.length;
			this.batchStart = performance.now();
		}
		for (const file of files) {
			const key = this.nextKey++;
			this.files.set(key, file);
			this.items.push({
				key,
				name: file.webkitRelativePath || file.name,
				size: file.size,
				state: 'queued',
				progress: 0,
				message: 'Waiting',
				bpm: null,
				confidence: null,
				track: null
			});
		}
		this.pump();
	}

	cancel() {
		for (const item of this.batch) {
			if (item.state === 'queued') this.finish(item, 'cancelled', 'Cancelled before it started.');
		}
		for (const c of this.controllers.values()) c.abort();
	}

	clearFinished() {
		if (this.busy) return;
		this.items = [];
		this.batchFrom = 0;
	}

	private item(key: number) {
		return this.items.find((i) => i.key === key)!;
	}

	private pump() {
		const limit = this.deps.concurrency ?? 2;
		while (this.running < limit) {
			const next = this.items.find((i) => i.state === 'queued');
			if (!next) return;
			this.running++;
			void this.process(next.key).finally(() => {
				this.running--;
				this.now = performance.now();
				this.pump();
			});
		}
	}

	private finish(item: QueueItem, state: ItemState, message: string) {
		item.state = state;
		item.message = message;
		item.progress = state === 'failed' || state === 'cancelled' ? item.progress : 1;
		this.files.delete(item.key);
		this.now = performance.now();
	}

	private async process(key: number) {
		const file = this.files.get(key);
		const item = this.item(key);
		if (!file) return;
		const controller = new AbortController();
		this.controllers.set(key, controller);
		try {
			item.state = 'analysing';
			item.progress = null;
			item.message = 'Reading tags and measuring the tempo…';
			// Yield a frame first, so the row shows its new state before the decoder runs.
			await new Promise((r) => setTimeout(r, 0));
			const a = await this.deps.analyse(file, controller.signal);
			controller.signal.throwIfAborted();
			this.item(key).bpm = analysisBody(a).bpm;
			this.item(key).confidence = a.tempo.confidence;
			Object.assign(this.item(key), { state: 'uploading', progress: 0, message: 'Uploading…' });
			const form = new FormData();
			form.set('file', file);
			form.set('analysis', JSON.stringify(analysisBody(a)));
			const answer = await this.deps.upload(
				form,
				(f) => (this.item(key).progress = f),
				controller.signal
			);
			const { track, duplicate, error } = answer.body;
			if (answer.status >= 400 || !track) {
				this.finish(this.item(key), 'failed', error ?? `The server refused it (${answer.status}).`);
				return;
			}
			this.item(key).track = track;
			this.finish(
				this.item(key),
				duplicate ? 'duplicate' : 'stored',
				duplicate ? 'Already in the library: kept the existing track.' : 'Stored.'
			);
			this.deps.onTrack(track);
		} catch (e) {
			const aborted = controller.signal.aborted;
			this.finish(
				this.item(key),
				aborted ? 'cancelled' : 'failed',
				aborted ? 'Cancelled.' : e instanceof Error ? e.message : String(e)
			);
		} finally {
			this.controllers.delete(key);
		}
	}
}

/** What POST /api/tracks expects beside the file (src/lib/music/track-schemas.ts). */
export function analysisBody(a: FileAnalysis) {
	// The file's own BPM tag is preferred only when the measurement agrees with it (within 4 %):
	// then it is the producer's exact figure; otherwise the measurement stands (issue 3).
	const tag = a.tempo.tagAgrees && a.tags.tagBpm !== null ? a.tags.tagBpm : null;
	return {
		bpm: tag ?? a.tempo.bpm,
		rawBpm: a.tempo.rawBpm,
		offsetS: a.tempo.offsetS,
		confidence: a.tempo.confidence,
		// A BPM tag that agrees settles which level it is.
		alternative: tag === null ? a.tempo.alternative : null,
		source: tag === null ? a.tempo.source : ('tag' as const),
		meter: a.meter,
		candidates: a.tempo.candidates.slice(0, 16),
		title: a.tags.title ?? undefined,
		artist: a.tags.artist ?? undefined,
		album: a.tags.album ?? undefined
	};
}

/** Uploads with XMLHttpRequest, which (unlike fetch) reports upload progress. */
export function xhrUpload(
	form: FormData,
	onProgress: (fraction: number) => void,
	signal: AbortSignal
): Promise<UploadAnswer> {
	return new Promise((resolve, reject) => {
		const xhr = new XMLHttpRequest();
		xhr.open('POST', '/api/tracks');
		xhr.responseType = 'json';
		xhr.setRequestHeader('accept', 'application/json');
		xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
		xhr.onload = () => resolve({ status: xhr.status, body: xhr.response ?? {} });
		xhr.onerror = () => reject(new Error('The upload failed: the connection dropped.'));
		xhr.onabort = () => reject(new DOMException('Cancelled', 'AbortError'));
		signal.addEventListener('abort', () => xhr.abort(), { once: true });
		xhr.send(form);
	});
}
