// The parts of the objective that score one entry in its place, shared by the full evaluation
// and the greedy's look-ahead; and the small penalties for requests and the lesson's reprise.
import { energyOf as energyOfImport, energyTarget as energyTargetImport } from './crowd';
import { formationCost, partnerTwice } from './formation';
import type { Cand, Plan, Problem, RequestInfo } from './model';
import type { ObjectiveTerms } from './types';

// Local bindings: module namespace getters are measurably slow in the search's inner loop.
const energyOf = energyOfImport;
const energyTarget = energyTargetImport;

/** Penalty for each hard rule broken: far above any sum of preferences. */
export const HARD = 1000;
const EARLY_S = 30 * 60;
const AFTER_LESSON_S = 15 * 60;

/** Running state along the night, shared by the full evaluation and the greedy's look-ahead. */
export interface Walk {
	prevRh: string;
	prev2Rh: string;
	fastRun: number;
	advRun: number;
	sinceAdv: number;
	prevEff: number;
	prevE: number;
	/** Seconds of dancing since the last rest. */
	dancing: number;
	/** The dance before was a partner dance (a rest clears it). */
	prevPartner: boolean;
	/** Dances since the last partner dance (kept across rests: the mix spans the night). */
	sinceCouple: number;
}

export const newWalk = (): Walk => ({
	prevRh: '',
	prev2Rh: '',
	fastRun: 0,
	advRun: 0,
	sinceAdv: 99,
	prevEff: 0,
	prevE: -1,
	dancing: 0,
	prevPartner: false,
	sinceCouple: 0
});

export function restWalk(w: Walk): void {
	w.prevRh = '';
	w.prev2Rh = '';
	w.fastRun = 0;
	w.advRun = 0;
	w.prevE = -1;
	w.prevEff = 0;
	w.dancing = 0;
	w.prevPartner = false;
}

/** First start of social dancing, for "easier early in the evening". */
export function firstDanceStart(problem: Problem, plan: Plan): number {
	for (const s of plan) if (s.kind === 'dance') return s.start;
	return 0;
}

export function isAfterLesson(problem: Problem, start: number): boolean {
	const ls = problem.lessons;
	for (let i = 0; i < ls.length; i++) {
		if (start >= ls[i].endS && start - ls[i].endS < AFTER_LESSON_S) return true;
	}
	return false;
}

export function isEarly(firstDance: number, start: number): boolean {
	return start - firstDance < EARLY_S;
}

/** Soft cost of one social dance entry, by term, added into `into` (unweighted). The caller
 * checks repeats and track reuse. Returns the weighted sum, with HARD for three advanced in a
 * row. Does not change the walk. */
export function danceCost(
	problem: Problem,
	w: Walk,
	c: Cand,
	start: number,
	firstDance: number,
	into: ObjectiveTerms | null
): number {
	const s = problem.settings;
	const wt = s.weights;
	const d = problem.dances[c.dance];
	let difficulty = problem.levelCost[d.rank];
	if (isEarly(firstDance, start) || isAfterLesson(problem, start)) {
		difficulty += Math.max(0, d.rank - 1) * 0.8;
	}
	if (d.rank === 4 && w.sinceAdv < 3) difficulty += 1.5;
	let hard = d.rank === 4 && w.advRun >= 2 ? HARD : 0;
	if (partnerTwice(s, w.prevPartner, d.partner)) hard += HARD;
	const formation = formationCost(s, problem.havePartner, w.sinceCouple, d.partner);
	let tempo = 0;
	const fast = c.eff >= s.fastBpm;
	if (fast && w.fastRun >= s.maxConsecutiveFast) tempo += 4;
	if (w.prevEff > 0 && c.eff > 0 && Math.abs(c.eff - w.prevEff) < 3) tempo += 0.3;
	const e = energyOf(c.eff);
	const tg = energyTarget(start / problem.eveningS);
	let energy = 2 * (e - tg) * (e - tg);
	if (w.prevE >= 0 && Math.abs(e - w.prevE) > 0.45) energy += 0.5;
	let rhythm = 0;
	if (d.rhythm === w.prevRh) rhythm += d.rhythm === 'waltz' ? 3 : 1;
	if (d.rhythm === w.prev2Rh) rhythm += 0.5;
	const phrasing = 2 * (1 - c.score);
	if (into) {
		into.difficulty += difficulty;
		into.tempo += tempo;
		into.energy += energy;
		into.rhythm += rhythm;
		into.phrasing += phrasing;
		into.formation += formation;
		into.hard += hard;
	}
	return (
		wt.difficulty * difficulty +
		wt.tempo * tempo +
		wt.energy * energy +
		wt.rhythm * rhythm +
		wt.phrasing * phrasing +
		wt.formation * formation +
		hard
	);
}

export function advanceDance(problem: Problem, w: Walk, c: Cand): void {
	const d = problem.dances[c.dance];
	w.prev2Rh = w.prevRh;
	w.prevRh = d.rhythm;
	w.fastRun = c.eff >= problem.settings.fastBpm ? w.fastRun + 1 : 0;
	w.advRun = d.rank === 4 ? w.advRun + 1 : 0;
	w.sinceAdv = d.rank === 4 ? 0 : w.sinceAdv + 1;
	w.prevEff = c.eff;
	w.prevE = energyOf(c.eff);
	w.prevPartner = d.partner;
	w.sinceCouple = d.partner ? 0 : w.sinceCouple + 1;
}

/** The lesson's practice play counts for what follows: a waltz lesson is not followed by a
 * waltz, nor a partner lesson by a partner dance. It scores nothing itself. */
export function lessonPlay(problem: Problem, w: Walk, c: Cand): void {
	const d = problem.dances[c.dance];
	w.prev2Rh = '';
	w.prevRh = d.rhythm;
	w.prevPartner = d.partner;
}

/** What coming last in its block costs an accepted request, as a share of a missed request's
 * cost: enough to order the block. Outside the block it costs this much more again, so the
 * block stays the better place. Chosen, not measured. */
const FIRST_IN_BLOCK = 0.5;

/** Penalty for a request by where its dance was played (0 in its block, 1 when missing); an
 * accepted request costs a little more the later it comes in its block. */
export function requestCost(problem: Problem, r: RequestInfo, starts: number[]): number {
	if (starts.length === 0) return 1;
	if (r.section < 0) return 0;
	const sec = problem.sections[r.section];
	let best = 1;
	for (const t of starts) {
		const dist = t < sec.startS ? sec.startS - t : t >= sec.endS ? t - sec.endS : 0;
		const inBlock = r.first ? (FIRST_IN_BLOCK * (t - sec.startS)) / (sec.endS - sec.startS) : 0;
		const outside = Math.min(0.8, 0.2 + dist / 3600) + (r.first ? FIRST_IN_BLOCK : 0);
		best = Math.min(best, dist === 0 ? inBlock : Math.min(1, outside));
	}
	return best;
}

/** Penalty for when the lesson's dance comes back at full tempo, best of its plays. */
export function repriseCost(delays: number[]): number {
	let best = Infinity;
	for (const delay of delays) {
		const c =
			delay < 900
				? ((900 - delay) / 900) * 0.5
				: delay > 5400
					? Math.min(1, (delay - 5400) / 3600)
					: 0;
		best = Math.min(best, c);
	}
	return best;
}
