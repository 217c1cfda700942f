// The DJ's one-click ×2 / ÷2: take the measured candidate at that tempo when there is one
// (its refined value is more precise than plain doubling), else the plain product.
import type { TempoCandidate } from './resolve';

export function flipTempo(
	bpm: number,
	factor: 2 | 0.5 | 1.5 | 0.75,
	candidates: TempoCandidate[] = []
): number {
	const target = bpm * factor;
	let best: TempoCandidate | null = null;
	for (const c of candidates)
		if (Math.abs(c.bpm / target - 1) <= 0.04 && (!best || c.score > best.score)) best = c;
	return best ? best.bpm : Math.round(target * 100) / 100;
}
