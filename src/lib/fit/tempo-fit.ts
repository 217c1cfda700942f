// Tempo fit: a track's measured tempo against a dance's range, directly, counted at half or
// double, or at a playback rate a DJ accepts. Effective tempo is bpm × rate (DESIGN.md, "Tempo").
import type { DanceFacts } from '../domain';
import { DEFAULT_FIT_SETTINGS, type FitSettings } from './settings';

/**
 * How the dance's counts sit on the track's beats. The count tempo is trackBpm × factor:
 * 'direct' factor 1; 'half' factor ½ — the track is counted at half its tempo (a 4/4 track at
 * 240 danced at 120); 'double' factor 2 — two counts to each measured beat (60 danced at 120).
 */
export type TempoRelation = 'direct' | 'half' | 'double';

export const RELATION_FACTOR: Record<TempoRelation, number> = { direct: 1, half: 0.5, double: 2 };

// Direct first so that, at equal rate change, direct counting wins.
const RELATIONS: readonly TempoRelation[] = ['direct', 'half', 'double'];
const DIRECT_ONLY: readonly TempoRelation[] = ['direct'];

export interface TempoFit {
	trackBpm: number;
	/** The tempo the dancers count: trackBpm × factor × rate. */
	effectiveBpm: number;
	/** Playback rate (1 = as recorded). When out of range: 1, the song is not changed. */
	rate: number;
	relation: TempoRelation;
	/** The effective tempo is inside the range at a rate within the bound. */
	inRange: boolean;
	/** Relative tempo change still needed to reach the range, |needed rate − 1| (0 = inside). */
	distance: number;
	/** The rate that would reach the range (equals `rate` when inRange). */
	neededRate: number;
}

type Range = Pick<DanceFacts, 'bpmMin' | 'bpmMax'>;

// Rates are kept to 3 decimals, rounded towards the inside of the range so they still land in it.
const roundUp = (x: number) => Math.ceil(x * 1000 - 1e-6) / 1000;
const roundDown = (x: number) => Math.floor(x * 1000 + 1e-6) / 1000;

/** The rate that brings a count tempo into the range by the smallest change (1 when inside). */
export function rateIntoRange(countBpm: number, range: Range): number {
	if (countBpm < range.bpmMin) return roundUp(range.bpmMin / countBpm);
	if (countBpm > range.bpmMax) return roundDown(range.bpmMax / countBpm);
	return 1;
}

const EPS = 1e-9;

/** Best way to dance a track in the range: the smallest rate change, direct on a tie. */
export function fitTempo(
	trackBpm: number,
	range: Range,
	settings: Pick<FitSettings, 'maxRateChange' | 'allowHalfDouble'> = DEFAULT_FIT_SETTINGS
): TempoFit {
	const relations = settings.allowHalfDouble ? RELATIONS : DIRECT_ONLY;
	let best: TempoRelation = 'direct';
	let bestRate = 1;
	let bestChange = Infinity;
	for (const relation of relations) {
		const rate = rateIntoRange(trackBpm * RELATION_FACTOR[relation], range);
		const change = Math.abs(rate - 1);
		if (change < bestChange - EPS) {
			best = relation;
			bestRate = rate;
			bestChange = change;
		}
	}
	const countBpm = trackBpm * RELATION_FACTOR[best];
	const inRange = bestChange <= settings.maxRateChange + EPS;
	const rate = inRange ? bestRate : 1;
	return {
		trackBpm,
		effectiveBpm: countBpm * rate,
		rate,
		relation: best,
		inRange,
		distance: inRange ? 0 : bestChange,
		neededRate: bestRate
	};
}

/**
 * Tempo at a rate someone chose (a team verdict): the relation whose count tempo lands in the
 * range at that rate, else the one landing nearest; direct on a tie.
 */
export function tempoAtRate(
	trackBpm: number,
	range: Range,
	rate: number,
	allowHalfDouble = true
): TempoFit {
	const relations = allowHalfDouble ? RELATIONS : DIRECT_ONLY;
	let best: TempoRelation = 'direct';
	let bestChange = Infinity;
	let bestNeeded = 1;
	for (const relation of relations) {
		const needed = rateIntoRange(trackBpm * RELATION_FACTOR[relation] * rate, range);
		const change = Math.abs(needed - 1);
		if (change < bestChange - EPS) {
			best = relation;
			bestChange = change;
			bestNeeded = needed;
		}
	}
	return {
		trackBpm,
		effectiveBpm: trackBpm * RELATION_FACTOR[best] * rate,
		rate,
		relation: best,
		inRange: bestChange <= EPS,
		distance: bestChange,
		neededRate: rate * bestNeeded
	};
}
