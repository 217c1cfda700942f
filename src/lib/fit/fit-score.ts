// The fit score: one number from 0 to 1 for a track danced to a dance, with its reasons in plain
// words (DESIGN.md, "Fit score"). The weights are our judgement; tempo and meter gate the rest.
import type { DanceFacts, TrackFacts, Verdict } from '../domain';
import { fitMeter } from './meter-fit';
import { phrasingFor, type Phrasing, type PhrasingDetail } from './phrasing';
import { fitReasons, ReasonMemo } from './fit-reasons';
import { resolveFitSettings, type FitSettings } from './settings';
import {
	fitTempo,
	RELATION_FACTOR,
	tempoAtRate,
	type TempoFit,
	type TempoRelation
} from './tempo-fit';

/** The team's word on a pairing; `rate` is the playback rate chosen with 'fits-at-rate'. */
export interface TeamVerdict {
	verdict: Verdict;
	rate?: number | null;
}

/** One result, in the shape the fits API sends. */
export interface FitItem {
	trackId: number;
	danceId: number;
	score: number;
	verdict: Verdict | null;
	tempo: {
		trackBpm: number | null;
		effectiveBpm: number | null;
		rate: number;
		relation: TempoRelation;
	};
	phrasing: Phrasing;
	reasons: string[];
}

/** Tempo component when the track has no measured tempo: low, but above a clear misfit. */
const UNMEASURED_TEMPO = 0.2;
/** Tempo component ceiling for a tempo outside the range even at the bound. */
const OUT_OF_RANGE_TEMPO = 0.15;

function tempoScore(t: TempoFit, s: FitSettings, triple: boolean): number {
	const bound = s.maxRateChange;
	const relation =
		t.relation === 'direct' ? 1 : triple ? s.tripleHalfDoubleFactor : s.halfDoubleFactor;
	if (t.inRange) {
		const change = Math.abs(t.rate - 1);
		const used = bound > 0 ? Math.min(1, change / bound) : change > 0 ? 1 : 0;
		// At the bound the tempo counts 0.7: danceable, but a direct fit is better.
		return (1 - 0.3 * used) * relation;
	}
	const over = (t.distance - bound) / (2 * Math.max(bound, 0.01));
	return OUT_OF_RANGE_TEMPO * Math.min(1, Math.max(0, 1 - over)) * relation;
}

/** 1 = starts every repetition on a phrase; lower the longer it takes to line up again. */
function alignmentScore(p: PhrasingDetail, counts: number): number {
	const k = p.realignAfterRepetitions;
	if (k == null) return 0.3;
	if (k === 1) return 1;
	// A short dance that fits whole into the phrase (16 over 32) restarts on a phrase boundary.
	if (!p.hasEvents && p.phraseCounts % counts === 0) return 0.95;
	return Math.max(0.3, 1 - 0.12 * (k - 1));
}

const rounded = (x: number) => Math.round(x * 1000) / 1000;

/**
 * Score one track for one dance. `verdict` (the team's) outranks the computed figures: with
 * 'fits' the track is taken as it is (rate 1, or the verdict's rate), with 'fits-at-rate' at the
 * verdict's rate (or the best rate when none is given), with 'does-not-fit' the score is 0.
 * `withReasons`: false skips the words (the ranking does, for tracks it will not show); a
 * ReasonMemo shares sentences across calls for the same dance and settings.
 */
export function fitTrackToDance(
	track: TrackFacts,
	dance: DanceFacts,
	verdict?: TeamVerdict | null,
	settings?: Partial<FitSettings> | FitSettings | null,
	withReasons: boolean | ReasonMemo = true
): FitItem {
	const s = isResolved(settings) ? settings : resolveFitSettings(settings);
	const v = verdict?.verdict ?? null;
	const vRate = verdict?.rate != null && verdict.rate > 0 ? verdict.rate : null;
	const range =
		dance.bpmMin <= dance.bpmMax ? dance : { bpmMin: dance.bpmMax, bpmMax: dance.bpmMin };
	const meter = fitMeter(track.meter, dance.meter);

	const bpm = track.bpm != null && track.bpm > 0 ? track.bpm : null;
	const fixedRate = v === 'fits' ? (vRate ?? 1) : v === 'fits-at-rate' ? vRate : null;
	let tempo: TempoFit | null = null;
	if (bpm != null) {
		tempo =
			fixedRate != null
				? tempoAtRate(bpm, range, fixedRate, s.allowHalfDouble)
				: fitTempo(bpm, range, s);
	}
	const rate = tempo ? tempo.rate : (vRate ?? 1);
	const p = phrasingFor(
		dance,
		track,
		tempo ? RELATION_FACTOR[tempo.relation] : 1,
		rate,
		s.cleanEndCounts
	);

	const clean = p.endsCleanly === true;
	const front = clean && p.endWall === 1;
	const phrasing =
		0.8 * alignmentScore(p, dance.counts) + 0.12 * (clean ? 1 : 0) + 0.08 * (front ? 1 : 0);
	const playedS = track.durationS / rate;
	let length = 0.5;
	if (p.repetitions != null) {
		if (p.repetitions < s.minRepetitions) length = 0.2;
		else if (playedS > s.longSongS)
			length = Math.max(0.4, 1 - (playedS - s.longSongS) / s.longSongS);
		else length = 1;
	}
	const tempoPart = tempo ? tempoScore(tempo, s, dance.meter === 3) : UNMEASURED_TEMPO;
	const computed = tempoPart * (0.55 + 0.3 * phrasing + 0.15 * length);
	const score = !meter.ok || v === 'does-not-fit' ? 0 : rounded(computed);

	const reasons = withReasons
		? fitReasons(
				{
					verdict: v,
					verdictRate: vRate,
					meterReason: meter.reason,
					tempo,
					fixedRate: fixedRate != null,
					range,
					phrasing: p,
					playedS
				},
				dance,
				s,
				withReasons === true ? null : withReasons
			)
		: [];

	return {
		trackId: track.id,
		danceId: dance.id,
		score,
		verdict: v,
		tempo: {
			trackBpm: bpm,
			effectiveBpm: tempo ? rounded(tempo.effectiveBpm) : null,
			rate,
			relation: tempo ? tempo.relation : 'direct'
		},
		phrasing: {
			driftCounts: p.driftCounts,
			realignAfterRepetitions: p.realignAfterRepetitions,
			secondsPerRepetition: p.secondsPerRepetition == null ? null : rounded(p.secondsPerRepetition),
			repetitions: p.repetitions,
			endWall: p.endWall,
			endsCleanly: p.endsCleanly
		},
		reasons
	};
}

const resolved = new WeakSet<object>();

/** Settings passed through resolveFitSettings once can be reused without copying per track. */
export function prepareSettings(settings?: Partial<FitSettings> | null): FitSettings {
	const s = resolveFitSettings(settings);
	resolved.add(s);
	return s;
}

function isResolved(s: unknown): s is FitSettings {
	return typeof s === 'object' && s !== null && resolved.has(s);
}
