// The ×2 / ÷2 flip: detectors confuse a tempo with its double or half (Gouyon et al. 2006 count
// those as octave errors, allowed in their Accuracy 2), so the DJ corrects it in one click.
// The flip lands on the measured candidate nearest the doubled or halved tempo, when one is
// within 4 % (the same tolerance as Accuracy 1), and on the plain product otherwise.
import type { TempoCandidateJson } from './track-types';

export const SAME_TEMPO = 0.04;

export function flipTempo(
	bpm: number,
	factor: 2 | 0.5,
	candidates: readonly TempoCandidateJson[] = []
): number {
	const target = bpm * factor;
	let best: number | null = null;
	for (const c of candidates) {
		const off = Math.abs(c.bpm / target - 1);
		if (off <= SAME_TEMPO && (best === null || off < Math.abs(best / target - 1))) best = c.bpm;
	}
	return round1(best ?? target);
}

/** Tempo the table and the API keep: one decimal is finer than any dancer can hear. */
export const round1 = (x: number) => Math.round(x * 10) / 10;

/** Whether a flip stays inside the range the API accepts (0–400 BPM, exclusive). */
export const canFlip = (bpm: number | null, factor: 2 | 0.5): bpm is number =>
	bpm !== null && bpm * factor > 20 && bpm * factor < 400;
