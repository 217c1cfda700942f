// The arithmetic of phrasing (DESIGN.md, "Phrasing"): a dance of C counts over music phrased in
// P beats drifts C mod P counts a repetition and lines up again after lcm(C, P) ÷ C repetitions.
import { secondsForCounts } from './figures';

export function gcd(a: number, b: number): number {
	a = Math.abs(a);
	b = Math.abs(b);
	while (b) {
		const r = a % b;
		a = b;
		b = r;
	}
	return a;
}

export function lcm(a: number, b: number): number {
	return a && b ? Math.abs(a * b) / gcd(a, b) : 0;
}

/** Counts the plain sequence slips against the phrase each repetition: C mod P. */
export function driftCounts(counts: number, phraseCounts: number): number {
	return counts % phraseCounts;
}

/** Repetitions of the plain sequence until it starts on a phrase again: lcm(C, P) ÷ C. */
export function realignAfterRepetitions(counts: number, phraseCounts: number): number {
	return lcm(counts, phraseCounts) / counts;
}

/** Seconds one plain repetition lasts at a count tempo: C × 60 ÷ bpm. */
export function secondsPerRepetition(counts: number, countBpm: number): number {
	return secondsForCounts(counts, countBpm);
}
