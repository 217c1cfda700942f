// Folding the onset envelope by a beat period: every frame is added to the bin of its phase
// within the beat. A true period stacks the onsets into a sharp peak, a slightly wrong one
// smears them, so the fold both measures a candidate and sharpens its period.
import type { Envelope } from './onset';

export interface Fold {
	/** Beat period in frames. */
	period: number;
	/** Phase of the strongest bin, frames from frame 0. */
	phase: number;
	/** Mean novelty at the beat. */
	on: number;
	/** Mean novelty over all frames (the baseline). */
	mean: number;
}

export function fold(env: Envelope, period: number): Fold {
	const x = env.values;
	const bins = Math.max(12, Math.round(period));
	const sum = new Float64Array(bins);
	const count = new Float64Array(bins);
	let total = 0;
	const scale = bins / period;
	let phase = 0;
	for (let i = 0; i < x.length; i++) {
		const b = Math.min(bins - 1, (phase * scale) | 0);
		sum[b] += x[i];
		count[b]++;
		total += x[i];
		phase += 1;
		if (phase >= period) phase -= period;
	}
	const mean = total / Math.max(1, x.length);
	const raw = Array.from(sum, (s, b) => (count[b] ? s / count[b] : 0));
	// A three-bin window, as onsets jitter by a frame or so (hits, hop rounding).
	const at = (b: number) => {
		const k = ((Math.round(b) % bins) + bins) % bins;
		return Math.max(raw[k], raw[(k + 1) % bins], raw[(k + bins - 1) % bins]);
	};
	let best = 0;
	for (let b = 1; b < bins; b++) if (raw[b] > raw[best]) best = b;
	const binToFrames = period / bins;
	return {
		period,
		phase: (best + 0.5) * binToFrames,
		on: at(best),
		mean
	};
}

/** Searches ±`spread` around `period` for the sharpest fold (the most precise period). */
export function refine(env: Envelope, period: number, spread = 0.03, steps = 12): Fold {
	let best = fold(env, period);
	for (const width of [spread, spread / steps]) {
		const centre = best.period;
		for (let s = -steps; s <= steps; s++) {
			if (s === 0) continue;
			const f = fold(env, centre * (1 + (width * s) / steps));
			if (f.on > best.on) best = f;
		}
	}
	return best;
}

export const bpmToPeriod = (bpm: number, frameRate: number): number => (60 * frameRate) / bpm;
export const periodToBpm = (period: number, frameRate: number): number => (60 * frameRate) / period;
