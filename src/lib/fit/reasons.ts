// The plain words every fit result carries. Numbers are rounded for reading, never for sums.
import type { TempoFit } from './tempo-fit';

/** 120 → "120", 87.96 → "88", 87.5 → "87.5". */
export function bpmText(bpm: number): string {
	const tenth = Math.round(bpm * 10) / 10;
	return Number.isInteger(tenth) ? String(tenth) : tenth.toFixed(1);
}

/** 0.96 → "0.96×". */
export function rateText(rate: number): string {
	return `${(Math.round(rate * 100) / 100).toFixed(2)}×`;
}

/** 0.08 → "8 %". */
export function percentText(fraction: number): string {
	return `${Math.round(fraction * 1000) / 10} %`;
}

export function rangeText(bpmMin: number, bpmMax: number): string {
	return bpmMin === bpmMax ? `${bpmText(bpmMin)} BPM` : `${bpmText(bpmMin)}–${bpmText(bpmMax)} BPM`;
}

const RELATION_WORDS = {
	direct: '',
	half: 'counted at half time',
	double: 'counted at double time'
};

/** "danced at 0.96× — 125 → 120 BPM", "counted at half time — 180 → 90 BPM", … */
export function tempoReason(
	t: TempoFit,
	bpmMin: number,
	bpmMax: number,
	maxRateChange: number
): string {
	const range = rangeText(bpmMin, bpmMax);
	if (!t.inRange && t.rate !== 1) {
		const side = t.effectiveBpm < bpmMin ? 'below' : 'above';
		return `danced at ${rateText(t.rate)} — ${bpmText(t.trackBpm)} → ${bpmText(t.effectiveBpm)} BPM, ${side} ${range}`;
	}
	if (!t.inRange) {
		const side = t.effectiveBpm < bpmMin ? 'too slow' : 'too fast';
		const how = t.relation === 'direct' ? '' : ` even ${RELATION_WORDS[t.relation]}`;
		return `${side}${how}: ${bpmText(t.trackBpm)} BPM would need ${rateText(t.neededRate)} to reach ${range} (the bound is ±${percentText(maxRateChange)})`;
	}
	const words = RELATION_WORDS[t.relation];
	const rated = t.rate !== 1;
	if (!words && !rated) return `${bpmText(t.trackBpm)} BPM, inside ${range}`;
	const lead = [words, rated ? `danced at ${rateText(t.rate)}` : ''].filter(Boolean).join(', ');
	return `${lead} — ${bpmText(t.trackBpm)} → ${bpmText(t.effectiveBpm)} BPM`;
}

export function driftReason(
	counts: number,
	drift: number,
	realign: number | null,
	phraseCounts: number,
	hasEvents: boolean
): string {
	if (hasEvents) {
		if (realign == null) {
			return `its tags and restarts leave it out of line with ${phraseCounts}-count phrases`;
		}
		if (realign === 1) return 'stays in phrase, tags and restarts included';
		const lead = drift ? `drifts ${drift} counts a repetition; ` : '';
		return `${lead}with its tags and restarts, back in line at least every ${realign}`;
	}
	if (drift === 0) return `stays in phrase: ${counts} counts over ${phraseCounts}-count phrases`;
	return `drifts ${drift} counts a repetition, back in line every ${realign}`;
}

/** "the starting wall", "the back wall", "wall 2 (a quarter turn to the left)". */
export function wallWords(wall: number, walls: 1 | 2 | 4, turn: 'left' | 'right' | null): string {
	if (wall === 1) return 'the starting wall';
	if ((walls === 2 && wall === 2) || (walls === 4 && wall === 3)) return 'the back wall';
	if (!turn) return `wall ${wall}`;
	// Walls are numbered in the turning direction: wall 2 is a quarter turn that way, wall 4 a
	// quarter turn the other way.
	const side = wall === 2 ? turn : turn === 'left' ? 'right' : 'left';
	return `wall ${wall} (a quarter turn to the ${side})`;
}

/** "1 whole repetition", "7 whole repetitions". */
export function plural(n: number, one: string, many = `${one}s`): string {
	return `${n} ${n === 1 ? one : many}`;
}
