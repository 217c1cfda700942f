// Half/double (and 3:2) tempo resolution. Detectors fold every candidate into one octave
// (web-audio-beat-detector's 90–180 window turns 72 into 144), so we gather candidates from
// the envelope's autocorrelation and the detector, add their ×2, ×½, ×3, ×⅓, ×3/2 and ×2/3
// relatives, measure each against the onset envelope and choose.
//
// Each candidate scores by how far its beat positions stand out of the onset envelope, lifted
// towards the faster of two levels that are nearly as strong (see score.ts), with small
// bonuses for a dance rhythm's range in the measured meter, for a rhythm the caller names,
// and for the file's own BPM tag when it matches a measured candidate within 4 %.
import type { Meter, Rhythm } from '../domain';
import { autocorrelationBpms } from './candidates';
import { bpmToPeriod, periodToBpm, refine, type Fold } from './comb';
import { guessMeter } from './meter';
import { onsetEnvelope, type Envelope } from './onset';
import { RHYTHM_PRESETS, rhythmsAt } from './rhythm-presets';
import { candidateScore, confidenceOf } from './score';

export interface TempoCandidate {
	bpm: number;
	score: number;
}

export interface TempoResult {
	bpm: number;
	/** What the detector (or, without one, the autocorrelation) said first. */
	rawBpm: number;
	/** Time of the first beat, seconds from the start of the PCM given. */
	offsetS: number;
	confidence: number;
	meter: Meter;
	/** Best first, distinct tempi (the ×2 and ÷2 flips are among them when plausible). */
	candidates: TempoCandidate[];
}

export interface ResolveOptions {
	/** Detector guesses, most trusted first. */
	detected?: number[];
	tagBpm?: number | null;
	meter?: Meter;
	rhythm?: Rhythm;
	minBpm?: number;
	maxBpm?: number;
}

const RATIOS = [1, 2, 0.5, 3, 1 / 3, 1.5, 2 / 3];
/** Tempi within this ratio are the same tempo (Gouyon et al. 2006 use 4 % for accuracy). */
const SAME = 0.02;
/** A first beat this close before the excerpt's start is the beat at its start. */
const START_SLACK_S = 0.03;

export function analysePcm(pcm: Float32Array, sampleRate: number, o: ResolveOptions = {}) {
	return resolveTempo(onsetEnvelope(pcm, sampleRate), o);
}

export function resolveTempo(env: Envelope, o: ResolveOptions = {}): TempoResult {
	const minBpm = o.minBpm ?? 50;
	const maxBpm = o.maxBpm ?? 240;
	const seeds = [...(o.detected ?? []), ...autocorrelationBpms(env, 40, 260)];
	if (seeds.length === 0) throw new Error('no beat found: the audio is too short or silent');
	const rawBpm = seeds[0];

	const folds: Fold[] = [];
	for (const seed of seeds)
		for (const ratio of RATIOS) {
			const bpm = seed * ratio;
			if (bpm < minBpm * 0.97 || bpm > maxBpm * 1.03) continue;
			if (folds.some((f) => near(periodToBpm(f.period, env.frameRate), bpm))) continue;
			const f = refine(env, bpmToPeriod(bpm, env.frameRate));
			const refined = periodToBpm(f.period, env.frameRate);
			if (!folds.some((g) => near(periodToBpm(g.period, env.frameRate), refined))) folds.push(f);
		}
	if (folds.length === 0) throw new Error('no beat found in the tempo range');

	const scored = folds.map((f) => {
		const bpm = periodToBpm(f.period, env.frameRate);
		const g = guessMeter(env, f, o.meter);
		const meter = g.meter;
		const score = candidateScore(f, bpm, {
			// Only where the accents show the meter: bars taken for beats look like 4/4 by default.
			inRhythm: (o.meter !== undefined || g.accented) && rhythmsAt(bpm, meter).length > 0,
			hinted: o.rhythm ? inRange(bpm, o.rhythm) : false,
			tagged: o.tagBpm ? Math.abs(bpm / o.tagBpm - 1) <= 0.04 : false
		});
		return { f, bpm, meter, score };
	});
	scored.sort((a, b) => b.score - a.score);
	const best = scored[0];
	const meter = o.meter ?? guessMeter(env, best.f).meter;
	const offsetS = env.startS + best.f.phase / env.frameRate;
	return {
		bpm: round2(best.bpm),
		rawBpm: round2(rawBpm),
		offsetS: firstBeatS(offsetS, 60 / best.bpm),
		confidence: confidenceOf(best, scored),
		meter,
		candidates: scored.map((s) => ({ bpm: round2(s.bpm), score: round3(s.score) }))
	};
}

/** The first grid position at or after the start, where one just before it counts as at it. */
export function firstBeatS(anyBeatS: number, beatS: number): number {
	const t = ((anyBeatS % beatS) + beatS) % beatS;
	return t > beatS - START_SLACK_S ? 0 : t;
}

const near = (a: number, b: number) => Math.abs(a / b - 1) < SAME;
const round2 = (x: number) => Math.round(x * 100) / 100;
const round3 = (x: number) => Math.round(x * 1000) / 1000;

function inRange(bpm: number, rhythm: Rhythm): boolean {
	const p = RHYTHM_PRESETS[rhythm];
	return bpm >= p.bpmMin * 0.96 && bpm <= p.bpmMax * 1.04;
}
