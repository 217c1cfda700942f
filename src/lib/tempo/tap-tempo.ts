// Tap tempo: the DJ taps along; the median of the recent intervals gives the tempo, so one
// late or doubled tap does not throw the estimate. A pause starts a new count.

export interface TapTempoOptions {
	/** Taps needed before an estimate is given (the issue asks for at least four). */
	minTaps?: number;
	/** How many of the latest intervals are used. */
	window?: number;
	/** A gap longer than this (ms) starts over … */
	resetAfterMs?: number;
	/** … and so does a gap longer than this many times the current interval. */
	resetFactor?: number;
}

export class TapTempo {
	private taps: number[] = [];
	private total = 0;
	private readonly minTaps: number;
	private readonly window: number;
	private readonly resetAfterMs: number;
	private readonly resetFactor: number;

	constructor(o: TapTempoOptions = {}) {
		this.minTaps = Math.max(2, o.minTaps ?? 4);
		this.window = o.window ?? 8;
		this.resetAfterMs = o.resetAfterMs ?? 2000;
		this.resetFactor = o.resetFactor ?? 2.5;
	}

	/** Records a tap at `timestampMs` (e.g. event.timeStamp) and returns the estimate or null. */
	tap(timestampMs: number): number | null {
		const last = this.taps[this.taps.length - 1];
		if (last !== undefined) {
			const gap = timestampMs - last;
			const interval = this.intervalMs();
			const paused =
				gap <= 0 ||
				gap > this.resetAfterMs ||
				(interval !== null && gap > this.resetFactor * interval);
			if (paused) this.reset();
		}
		this.taps.push(timestampMs);
		this.total++;
		if (this.taps.length > this.window + 1) this.taps.shift();
		return this.bpm();
	}

	/** Current estimate in BPM, or null with fewer than `minTaps` taps. */
	bpm(): number | null {
		if (this.taps.length < this.minTaps) return null;
		const interval = this.intervalMs();
		return interval === null ? null : 60_000 / interval;
	}

	/** Taps counted since the last reset. */
	get count(): number {
		return this.total;
	}

	reset(): void {
		this.taps = [];
		this.total = 0;
	}

	private intervalMs(): number | null {
		if (this.taps.length < 2) return null;
		const gaps = this.taps.slice(1).map((t, i) => t - this.taps[i]);
		return median(gaps);
	}
}

export function median(values: number[]): number {
	const s = [...values].sort((a, b) => a - b);
	const mid = s.length >> 1;
	return s.length % 2 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}
