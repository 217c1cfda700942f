// Reads the public input into the working model: indexes, playable pairings, sections in order.
import { levelRank } from '../domain';
import { LEVEL_MIX } from './crowd';
import { playedLengthS } from './time';
import type {
	Cand,
	DanceInfo,
	MustInfo,
	Problem,
	RequestInfo,
	SectionInfo,
	TrackInfo
} from './model';
import { resolveSettings } from './settings';
import { eveningLengthS } from './time';
import type { Id, PlanFit, PlanInput, PlanSettings } from './types';

/** The hard fit rule: a team verdict of fits, or no verdict and a computed score ≥ threshold. */
export function fitIsPlayable(fit: PlanFit, threshold: number): boolean {
	if (fit.verdict === 'does-not-fit') return false;
	if (fit.verdict === 'fits' || fit.verdict === 'fits-at-rate') return true;
	return fit.score >= threshold;
}

function makeCand(d: number, t: number, track: TrackInfo, rate: number, fit: PlanFit): Cand {
	return {
		dance: d,
		track: t,
		rate,
		dur: playedLengthS(track.durationS, rate),
		score: Math.max(0, Math.min(1, fit.score)),
		eff: track.bpm ? track.bpm * rate : 0,
		marked: fit.verdict === 'fits' || fit.verdict === 'fits-at-rate',
		lessonRate: fit.lessonRate && fit.lessonRate > 0 && fit.lessonRate < 1 ? fit.lessonRate : null
	};
}

/**
 * The count tempo a track is danced at: its tempo at the rate, halved or doubled (half- or
 * double-time counting) to land nearest the dance's range; the range's middle when the track's
 * tempo is unknown.
 */
function countBpm(dance: Pick<DanceInfo, 'bpmMin' | 'bpmMax'>, eff: number): number {
	if (!(eff > 0)) return (dance.bpmMin + dance.bpmMax) / 2;
	const off = (b: number) => Math.max(dance.bpmMin - b, b - dance.bpmMax, 0);
	return [eff, eff / 2, eff * 2].reduce((best, b) => (off(b) < off(best) ? b : best));
}

/**
 * The floor's length rule (issue 12): a pairing is never planned when the music, at its rate, is
 * shorter than minTrackS or than minRepetitions whole repetitions of the dance (counts × 60 ÷
 * count tempo each). Exported for the tests and for a swap's list of candidates.
 */
export function longEnough(
	dance: Pick<DanceInfo, 'counts' | 'bpmMin' | 'bpmMax'>,
	durS: number,
	eff: number,
	s: Pick<PlanSettings, 'minTrackS' | 'minRepetitions'>
): boolean {
	if (durS < s.minTrackS) return false;
	if (!(dance.counts > 0)) return true;
	return durS >= (s.minRepetitions * dance.counts * 60) / countBpm(dance, eff);
}

const byScore = (a: Cand, b: Cand) => b.score - a.score || a.track - b.track;

function readSections(input: PlanInput, eveningS: number, notes: string[]): SectionInfo[] {
	const sorted = input.evening.sections
		.map((s, i) => ({ s, i }))
		.sort((a, b) => a.s.startS - b.s.startS || a.i - b.i);
	const out: SectionInfo[] = [];
	let floor = 0;
	for (const { s } of sorted) {
		const startS = Math.max(s.startS, floor, 0);
		const endS = Math.min(s.endS, eveningS);
		if (endS <= startS) {
			notes.push(`Section "${s.title ?? s.kind}" lies outside the evening or overlaps another.`);
			continue;
		}
		if (s.endS > eveningS)
			notes.push(
				`Section "${s.title ?? s.kind}" ends after the evening, so it was cut at the evening's end.`
			);
		if (startS > s.startS) notes.push(`Section "${s.title ?? s.kind}" was trimmed to start later.`);
		out.push({ id: s.id, kind: s.kind, startS, endS, title: s.title, dance: -1 });
		floor = endS;
	}
	return out;
}

export function prepare(
	input: PlanInput,
	settings: PlanSettings = resolveSettings(input)
): Problem {
	const eveningS = eveningLengthS(input.evening.startsAt, input.evening.endsAt);
	const notes: string[] = [];
	const violations: string[] = [];
	const neverD = new Set<Id>(input.neverPlay?.danceIds ?? []);
	const neverT = new Set<Id>(input.neverPlay?.trackIds ?? []);
	const danceIndex = new Map<Id, number>();
	const trackIndex = new Map<Id, number>();
	const dances: DanceInfo[] = input.dances.map((d, i) => {
		danceIndex.set(d.id, i);
		return {
			id: d.id,
			name: d.name,
			rank: levelRank(d.level),
			rhythm: d.rhythm,
			wellKnown: d.wellKnown === true,
			partner: d.formation === 'partner',
			bpmMin: d.bpmMin,
			bpmMax: d.bpmMax,
			counts: d.counts,
			cands: [],
			full: []
		};
	});
	const tracks: TrackInfo[] = input.tracks.map((t, i) => {
		trackIndex.set(t.id, i);
		return { id: t.id, title: t.title, artist: t.artist, durationS: t.durationS, bpm: t.bpm };
	});
	const seen = new Set<number>();
	const playableFits: { fit: PlanFit; d: number; t: number }[] = [];
	for (const fit of input.fits) {
		const d = danceIndex.get(fit.danceId);
		const t = trackIndex.get(fit.trackId);
		if (d === undefined || t === undefined) continue;
		if (neverD.has(fit.danceId) || neverT.has(fit.trackId)) continue;
		if (!fitIsPlayable(fit, settings.fitThreshold)) continue;
		const key = d * tracks.length + t;
		if (seen.has(key)) continue;
		seen.add(key);
		const rate = fit.rate && fit.rate > 0 ? fit.rate : 1;
		if (!(tracks[t].durationS > 0)) continue;
		const cand = makeCand(d, t, tracks[t], rate, fit);
		if (!longEnough(dances[d], cand.dur, cand.eff, settings)) continue;
		playableFits.push({ fit, d, t });
		dances[d].cands.push(cand);
		if (Math.abs(rate - 1) <= settings.fullTempoTolerance) dances[d].full.push(cand);
	}
	for (const d of dances) {
		d.cands.sort(byScore);
		d.full.sort(byScore);
	}
	const sections = readSections(input, eveningS, notes);
	const lessons: Problem['lessons'] = [];
	sections.forEach((s, i) => {
		if (s.kind !== 'lesson') return;
		const src = input.evening.sections.find((x) => x.id === s.id);
		const d = src?.danceId === undefined ? undefined : danceIndex.get(src.danceId);
		if (d === undefined) {
			violations.push(`The lesson "${s.title ?? 'lesson'}" has no known dance to teach.`);
			return;
		}
		s.dance = d;
		lessons.push({ section: i, dance: d, endS: s.endS });
	});
	const firstBlock = sections.findIndex((s) => s.kind === 'request-block');
	const requests: RequestInfo[] = [];
	for (const r of input.requests ?? []) {
		const d = danceIndex.get(r.danceId);
		if (d === undefined) {
			notes.push(`A request names a dance that is not in the catalogue.`);
			continue;
		}
		const sec = r.sectionId === undefined ? -1 : sections.findIndex((s) => s.id === r.sectionId);
		requests.push({
			dance: d,
			section: sec >= 0 ? sec : firstBlock,
			weight: r.weight ?? 1,
			first: r.first === true
		});
	}
	const must: MustInfo[] = [];
	for (const m of input.mustPlay ?? []) {
		const spec = typeof m === 'object' ? m : { danceId: m };
		const d = danceIndex.get(spec.danceId);
		if (d === undefined) {
			notes.push(`A must-play dance is not in the catalogue.`);
			continue;
		}
		const t = spec.trackId === undefined ? -1 : (trackIndex.get(spec.trackId) ?? -2);
		must.push({ dance: d, track: t });
	}
	const playable = dances.map((_, i) => i).filter((i) => dances[i].cands.length > 0);
	const levelMix = LEVEL_MIX[input.evening.crowd];
	const top = Math.max(...levelMix);
	const byDance = <T>() => dances.map((): T[] => []);
	const requestsOf = byDance<RequestInfo>();
	for (const r of requests) requestsOf[r.dance].push(r);
	const mustOf = byDance<MustInfo>();
	for (const m of must) mustOf[m.dance].push(m);
	const lessonOf = byDance<number>();
	lessons.forEach((l, i) => lessonOf[l.dance].push(i));
	return {
		settings,
		crowd: input.evening.crowd,
		eveningS: Math.max(1, eveningS),
		levelMix,
		levelCost: levelMix.map((p) => 2 * (1 - p / top)),
		playableByRank: [0, 1, 2, 3, 4].map((r) => playable.filter((i) => dances[i].rank === r)),
		requestsOf,
		mustOf,
		lessonOf,
		dances,
		tracks,
		sections,
		playable,
		havePartner: playable.some((i) => dances[i].partner),
		requests,
		must,
		lessons,
		inputNotes: notes,
		inputViolations: violations,
		danceIndex,
		trackIndex
	};
}

/** Lesson tempo: slowed (rate below 1), or already at or below the bottom of the dance's range. */
export function isLessonTempo(problem: Problem, c: Cand): boolean {
	const d = problem.dances[c.dance];
	return c.rate < 1 || (c.eff > 0 && c.eff <= d.bpmMin);
}

/** Lesson pairings: tracks the team slowed for teaching, then slow-enough tracks, then the best
 * fitting tracks slowed by the fallback rate. Every one is at lesson tempo (rate < 1, or at or
 * below the bottom of the dance's range). */
export function lessonCands(problem: Problem, d: number): Cand[] {
	const dance = problem.dances[d];
	const fallback = problem.settings.lessonFallbackRate;
	const marked: Cand[] = [];
	const slow: Cand[] = [];
	const slowed: Cand[] = [];
	const at = (c: Cand, raw: number): Cand => {
		const rate = Math.round(raw * 1000) / 1000;
		return {
			...c,
			rate,
			dur: playedLengthS(problem.tracks[c.track].durationS, rate),
			eff: c.eff > 0 ? (c.eff / c.rate) * rate : 0
		};
	};
	for (const c of dance.cands) {
		if (c.lessonRate !== null) marked.push(at(c, c.lessonRate));
		else if (isLessonTempo(problem, c)) slow.push(c);
		else slowed.push(at(c, c.rate * fallback));
	}
	return [...marked, ...slow, ...slowed];
}
