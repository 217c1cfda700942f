// Fits from the database: the engine's ranking over every track (or dance) with the team's
// verdicts, in the shape the fits API and the pages send.
import type { DanceFacts, TrackFacts } from '../../domain';
import { rankDancesForTrack, rankFits, type FitItem } from '../../fit';
import { danceRow } from '../dances/catalogue';
import { danceFacts, danceJson, type DanceJson } from '../dances/dance-json';
import {
	loadDanceRows,
	loadTrackFact,
	trackFacts,
	verdictsForDance,
	verdictsForTrack,
	type StoredVerdict
} from './load';
import { fitSettings } from './settings';

export const DEFAULT_FIT_LIMIT = 50;
export const MAX_FIT_LIMIT = 10_000;

export interface FitJson {
	/**
	 * The team says it fits, or (no verdict) the meter matches and the tempo lands inside the
	 * dance's range as the engine counts it (directly, half or double, within the rate bound).
	 */
	fitting: boolean;
	score: number;
	verdict: FitItem['verdict'];
	/** The team's chosen rate and notes, when it has given a verdict. */
	decision: { rate: number | null; notes: string; lessonRate: number | null } | null;
	tempo: FitItem['tempo'];
	phrasing: FitItem['phrasing'];
	reasons: string[];
}

/** Half a BPM of slack, so a rate rounded to 3 decimals still counts as reaching the range. */
const RANGE_SLACK_BPM = 0.5;

export function isFitting(item: FitItem, range: { bpmMin: number; bpmMax: number }): boolean {
	if (item.verdict) return item.verdict !== 'does-not-fit';
	const bpm = item.tempo.effectiveBpm;
	return (
		item.score > 0 &&
		bpm != null &&
		bpm >= range.bpmMin - RANGE_SLACK_BPM &&
		bpm <= range.bpmMax + RANGE_SLACK_BPM
	);
}

function fitJson(
	item: FitItem,
	stored: StoredVerdict | undefined,
	range: { bpmMin: number; bpmMax: number }
): FitJson {
	return {
		fitting: isFitting(item, range),
		score: item.score,
		verdict: item.verdict,
		decision: stored
			? { rate: stored.rate ?? null, notes: stored.notes, lessonRate: stored.lessonRate }
			: null,
		tempo: item.tempo,
		phrasing: item.phrasing,
		reasons: item.reasons
	};
}

/** `?limit=` as a whole number within bounds, or the default. */
export function parseLimit(text: string | null): number | null {
	if (text == null || text === '') return DEFAULT_FIT_LIMIT;
	if (!/^\d+$/.test(text)) return null;
	const n = Number(text);
	return n >= 1 && n <= MAX_FIT_LIMIT ? n : null;
}

export interface DanceFits {
	dance: DanceJson;
	facts: DanceFacts;
	items: (FitJson & { track: TrackFacts })[];
	/** Every track's facts, for callers that go on to lesson music without reading them twice. */
	tracks: TrackFacts[];
	verdicts: Map<number, StoredVerdict>;
}

export function fitsForDance(danceId: number, limit = DEFAULT_FIT_LIMIT): DanceFits | null {
	const row = danceRow(danceId);
	if (!row) return null;
	const facts = danceFacts(row);
	const { facts: tracks, byId } = trackFacts();
	const verdicts = verdictsForDance(danceId);
	const ranked = rankFits(facts, tracks, verdicts, fitSettings(), limit);
	return {
		dance: danceJson(row),
		facts,
		tracks,
		verdicts,
		items: ranked.map((item) => ({
			track: byId.get(item.trackId)!,
			...fitJson(item, verdicts.get(item.trackId), facts)
		}))
	};
}

export interface TrackFits {
	track: TrackFacts;
	items: (FitJson & { dance: DanceJson })[];
}

export function fitsForTrack(trackId: number, limit = DEFAULT_FIT_LIMIT): TrackFits | null {
	const track = loadTrackFact(trackId);
	if (!track) return null;
	const rows = loadDanceRows();
	const byId = new Map(rows.map((r) => [r.id, r]));
	const verdicts = verdictsForTrack(trackId);
	const ranked = rankDancesForTrack(track, rows.map(danceFacts), verdicts, fitSettings(), limit);
	const items = ranked.map((item) => ({
		dance: danceJson(byId.get(item.danceId)!),
		...fitJson(item, verdicts.get(item.danceId), byId.get(item.danceId)!)
	}));
	return { track, items };
}
