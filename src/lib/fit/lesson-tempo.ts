// Lesson tempo: music for a teach slot, slower than the dance's range for the crowd's level
// (DESIGN.md, "Lesson tempo"). Teaching slows music by roughly 10–15 % (REFERENCES.md, common
// practice); the per-level split below is our reading of that practice, not a published rule.
import { LEVEL_LABELS, type DanceFacts, type Level, type TrackFacts } from '../domain';
import { fitTrackToDance, prepareSettings, type FitItem } from './fit-score';
import { fitMeter } from './meter-fit';
import { bpmText, rateText } from './reasons';
import { verdictFor, type VerdictLookup } from './rank';
import { shuffleSeconds } from './figures';
import type { FitSettings } from './settings';
import { RELATION_FACTOR, fitTempo, type TempoRelation } from './tempo-fit';

export interface LessonSettings {
	/** Fraction below the dance's slowest tempo (bpmMin) to teach at, per crowd level. */
	slowdownByLevel: Record<Level, number>;
	/** Slowest playback rate offered: past it the music sounds wrong (common practice/judgement). */
	minLessonRate: number;
	/** Fastest playback rate offered when a slow song must be sped up to the target. */
	maxLessonRate: number;
	/** A song counts as "already slow enough" from the target down to this fraction below it. */
	slowEnoughBelow: number;
}

/** Common practice (no source beyond "roughly 10–15 %", REFERENCES.md); settings, not rules. */
export const DEFAULT_LESSON_SETTINGS: Readonly<LessonSettings> = Object.freeze({
	slowdownByLevel: Object.freeze({
		'absolute-beginner': 0.15,
		beginner: 0.15,
		improver: 0.1,
		intermediate: 0.05,
		advanced: 0
	}),
	minLessonRate: 0.8,
	maxLessonRate: 1.08,
	slowEnoughBelow: 0.1
});

export const LESSON_CAUTION =
	'New dancers tire sooner: keep teaching blocks short, leave time for rest and water, and follow the venue’s rules on floor, footwear and sound levels.';

/** Settings as callers pass them: any subset, levels included. */
export type LessonSettingsInput = Partial<Omit<LessonSettings, 'slowdownByLevel'>> & {
	slowdownByLevel?: Partial<Record<Level, number>>;
};

function lessonSettings(partial?: LessonSettingsInput | null): LessonSettings {
	return {
		...DEFAULT_LESSON_SETTINGS,
		...partial,
		slowdownByLevel: { ...DEFAULT_LESSON_SETTINGS.slowdownByLevel, ...partial?.slowdownByLevel }
	};
}

export interface LessonTarget {
	level: Level;
	/** Fraction below bpmMin, e.g. 0.1. */
	slowdown: number;
	targetBpm: number;
	bpmMin: number;
	bpmMax: number;
	/** Seconds one shuffle (3 steps in 2 counts) takes at the target and at bpmMin. */
	shuffleSecondsAtTarget: number;
	shuffleSecondsAtDanceTempo: number;
	caution: string;
}

export function lessonTarget(
	dance: Pick<DanceFacts, 'bpmMin' | 'bpmMax'>,
	level: Level,
	settings?: LessonSettingsInput | null
): LessonTarget {
	const s = lessonSettings(settings);
	const slowdown = Math.min(0.9, Math.max(0, s.slowdownByLevel[level] ?? 0));
	const bpmMin = Math.min(dance.bpmMin, dance.bpmMax);
	const targetBpm = Math.round(bpmMin * (1 - slowdown) * 10) / 10;
	return {
		level,
		slowdown,
		targetBpm,
		bpmMin,
		bpmMax: Math.max(dance.bpmMin, dance.bpmMax),
		shuffleSecondsAtTarget: shuffleSeconds(targetBpm),
		shuffleSecondsAtDanceTempo: shuffleSeconds(bpmMin),
		caution: LESSON_CAUTION
	};
}

/**
 * Tracks already slow enough for the lesson as they are (rate 1): right meter, not rejected by
 * the team, counted (directly, half or double) between the target and `slowEnoughBelow` under
 * it. Slowest first, ties by id. Scored against that lesson window, so phrasing still counts.
 */
export function lessonTracks(
	dance: DanceFacts,
	tracks: readonly TrackFacts[],
	level: Level,
	verdictsByTrackId?: VerdictLookup | null,
	settings?: LessonSettingsInput | null,
	fitSettings?: Partial<FitSettings> | null
): FitItem[] {
	const s = lessonSettings(settings);
	const target = lessonTarget(dance, level, s);
	const window = {
		...dance,
		bpmMin: Math.round(target.targetBpm * (1 - s.slowEnoughBelow) * 10) / 10,
		bpmMax: target.targetBpm
	};
	const fs = prepareSettings({ ...fitSettings, maxRateChange: 0 });
	const items: FitItem[] = [];
	for (const track of tracks) {
		const v = verdictFor(verdictsByTrackId, track.id);
		if (v?.verdict === 'does-not-fit' || track.meter !== dance.meter) continue;
		if (track.bpm == null || !(track.bpm > 0) || !fitTempo(track.bpm, window, fs).inRange) continue;
		const item = fitTrackToDance(track, window, null, fs, true);
		item.verdict = v ? v.verdict : null;
		item.reasons.unshift(
			`slow enough for ${levelWords(level)} lesson: target ${bpmText(target.targetBpm)} BPM`
		);
		items.push(item);
	}
	return items.sort(
		(a, b) => (a.tempo.effectiveBpm ?? 0) - (b.tempo.effectiveBpm ?? 0) || a.trackId - b.trackId
	);
}

/** "an improver", "a beginner" — for the reasons' sentences. */
function levelWords(level: Level): string {
	const words = LEVEL_LABELS[level].toLowerCase();
	return `${/^[aeiou]/.test(words) ? 'an' : 'a'} ${words}`;
}

export type LessonRate =
	| {
			ok: true;
			/** Play with preservesPitch = true (the browser default) so the key stays put (MDN). */
			rate: number;
			targetBpm: number;
			trackBpm: number;
			relation: TempoRelation;
			effectiveBpm: number;
			reason: string;
	  }
	| { ok: false; rate: number | null; targetBpm: number; reason: string };

/** The playback rate that takes a track to the lesson target, or a refusal that says why. */
export function lessonRate(
	track: TrackFacts,
	dance: DanceFacts,
	level: Level,
	settings?: LessonSettingsInput | null
): LessonRate {
	const s = lessonSettings(settings);
	const { targetBpm } = lessonTarget(dance, level, s);
	const meter = fitMeter(track.meter, dance.meter);
	if (!meter.ok) return { ok: false, rate: null, targetBpm, reason: meter.reason ?? '' };
	if (track.bpm == null || !(track.bpm > 0)) {
		return { ok: false, rate: null, targetBpm, reason: 'tempo not measured yet' };
	}
	const bpm = track.bpm;
	let relation: TempoRelation = 'direct';
	for (const r of ['half', 'double'] as const) {
		const change = Math.abs(targetBpm / (bpm * RELATION_FACTOR[r]) - 1);
		if (change < Math.abs(targetBpm / (bpm * RELATION_FACTOR[relation]) - 1)) relation = r;
	}
	const countBpm = bpm * RELATION_FACTOR[relation];
	const rate = Math.round((targetBpm / countBpm) * 1000) / 1000;
	const reach = `reaching ${bpmText(targetBpm)} BPM from ${bpmText(countBpm)} needs ${rateText(rate)}`;
	if (rate < s.minLessonRate - 1e-9) {
		return {
			ok: false,
			rate,
			targetBpm,
			reason: `${reach} — slower than ${rateText(s.minLessonRate)}, where the music starts to sound wrong; choose a slower song`
		};
	}
	if (rate > s.maxLessonRate + 1e-9) {
		return {
			ok: false,
			rate,
			targetBpm,
			reason: `${reach} — faster than ${rateText(s.maxLessonRate)}; this song is too slow even for the lesson`
		};
	}
	return {
		ok: true,
		rate,
		targetBpm,
		trackBpm: bpm,
		relation,
		effectiveBpm: Math.round(countBpm * rate * 10) / 10,
		reason: `play at ${rateText(rate)} with pitch kept — ${bpmText(countBpm)} → ${bpmText(targetBpm)} BPM`
	};
}
