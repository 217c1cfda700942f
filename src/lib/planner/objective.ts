// The objective: a weighted penalty over the laid-out plan (0 is perfect, lower is better), with
// a large penalty for every hard rule broken so the search always prefers a feasible plan.
import {
	HARD,
	advanceDance as advanceDanceImport,
	danceCost as danceCostImport,
	firstDanceStart,
	lessonPlay,
	newWalk,
	repriseCost,
	requestCost,
	restWalk as restWalkImport,
	type Walk
} from './costs';
import { sizeStretch as sizeStretchImport } from './layout';
import type { Cand, Plan, Problem } from './model';
import { restLimitS } from './settings';
import type { ObjectiveTerms } from './types';

// Local bindings: module namespace getters are measurably slow in the search's inner loop.
const sizeStretch = sizeStretchImport;
const danceCost = danceCostImport;
const advanceDance = advanceDanceImport;
const restWalk = restWalkImport;

export { HARD };
const EPS = 1e-6;

export interface Evaluation {
	total: number;
	terms: ObjectiveTerms;
	hardCount: number;
}

export const zeroTerms = (): ObjectiveTerms => ({
	difficulty: 0,
	tempo: 0,
	energy: 0,
	rhythm: 0,
	phrasing: 0,
	requests: 0,
	mustPlay: 0,
	lastDance: 0,
	reprise: 0,
	filler: 0,
	breaks: 0,
	formation: 0,
	hard: 0
});

interface Scratch {
	lastStart: Float64Array;
	stamp: Int32Array;
	trackUse: Int32Array;
	trackStamp: Int32Array;
	gen: number;
	/** Plays seen in this evaluation: the first `occ` slots of each array are in use. */
	occ: number;
	occDance: Int32Array;
	occStart: Float64Array;
	occRate: Float64Array;
	occTrack: Int32Array;
	buf: number[];
	terms: ObjectiveTerms;
	weighted: ObjectiveTerms;
	walk: Walk;
	hist: number[];
	lastInSection: Map<number, Cand | null>;
}

const scratches = new WeakMap<Problem, Scratch>();

function growOcc(sc: Scratch): void {
	const n = sc.occDance.length * 2;
	const grow = <T extends Int32Array | Float64Array>(a: T, b: T): T => (b.set(a), b);
	sc.occDance = grow(sc.occDance, new Int32Array(n));
	sc.occStart = grow(sc.occStart, new Float64Array(n));
	sc.occRate = grow(sc.occRate, new Float64Array(n));
	sc.occTrack = grow(sc.occTrack, new Int32Array(n));
}

function scratchFor(problem: Problem): Scratch {
	let sc = scratches.get(problem);
	if (!sc) {
		sc = {
			lastStart: new Float64Array(problem.dances.length),
			stamp: new Int32Array(problem.dances.length),
			trackUse: new Int32Array(problem.tracks.length),
			trackStamp: new Int32Array(problem.tracks.length),
			gen: 0,
			occ: 0,
			occDance: new Int32Array(64),
			occStart: new Float64Array(64),
			occRate: new Float64Array(64),
			occTrack: new Int32Array(64),
			buf: [],
			terms: zeroTerms(),
			weighted: zeroTerms(),
			walk: newWalk(),
			hist: [0, 0, 0, 0, 0],
			lastInSection: new Map()
		};
		scratches.set(problem, sc);
	}
	sc.gen++;
	sc.occ = 0;
	return sc;
}

/** Starts of the social plays of a dance (to a given track, if any), into `out`. */
function startsOf(sc: Scratch, dance: number, track: number, out: number[]): number[] {
	out.length = 0;
	for (let i = 0; i < sc.occ; i++) {
		if (
			sc.occDance[i] === dance &&
			sc.occStart[i] >= 0 &&
			(track < 0 || sc.occTrack[i] === track)
		) {
			out.push(sc.occStart[i]);
		}
	}
	return out;
}

/** Just the total, for the search's inner loop: no objects allocated for the terms. */
export function evaluateTotal(problem: Problem, plan: Plan): number {
	return evaluate(problem, plan, true).total;
}

function resetTerms(t: ObjectiveTerms): ObjectiveTerms {
	t.difficulty = t.tempo = t.energy = t.rhythm = t.phrasing = t.requests = 0;
	t.mustPlay = t.lastDance = t.reprise = t.filler = t.breaks = t.formation = t.hard = 0;
	return t;
}

function resetWalk(w: Walk): Walk {
	restWalk(w);
	w.sinceAdv = 99;
	w.sinceCouple = 0;
	return w;
}

/** The full evaluation. With `reuse`, the returned terms are scratch, valid until the next call. */
export function evaluate(problem: Problem, plan: Plan, reuse = false): Evaluation {
	const s = problem.settings;
	const wt = s.weights;
	const sc = scratchFor(problem);
	const gen = sc.gen;
	const terms = reuse ? resetTerms(sc.terms) : zeroTerms();
	let hardCount = 0;
	const window = s.repeatWindowMin * 60;
	const breakLimit = restLimitS(s);
	const restGap = s.breakLengthMin * 60;
	const w = resetWalk(sc.walk);
	const hist = sc.hist;
	hist.fill(0);
	const firstDance = firstDanceStart(problem, plan);
	const lastInSection = sc.lastInSection;
	lastInSection.clear();
	let lastEnd = 0;
	for (const slot of plan) {
		sizeStretch(problem, slot);
		const lastSlot = slot.section >= 0 && problem.sections[slot.section].kind === 'last-dance';
		let t = slot.start;
		const items = slot.items;
		for (let k = 0; k < items.length; k++) {
			const it = items[k];
			if (k > 0) t += s.gapS;
			// A planned break keeps its end: short music leaves idle time before it, not after. A
			// little idle (up to the end tolerance) is a longer break; more is music missing.
			if (it.inserted && it.stretch) {
				const musicEnd = k > 0 ? t - s.gapS : slot.start;
				const idle = slot.target - s.gapS - it.maxDur - musicEnd;
				if (idle > s.endToleranceS + EPS) {
					terms.hard += HARD + idle * 5;
					hardCount++;
				} else if (idle > EPS) terms.filler += (idle / 60) * 0.5;
				if (t < slot.target - it.dur) t = slot.target - it.dur;
			}
			const start = t;
			const end = t + it.dur;
			if (start - lastEnd >= restGap) restWalk(w);
			// Past the evening's end is never traded for anything else.
			if (end > problem.eveningS + EPS && !it.locked) {
				terms.hard += HARD + HARD * 1000;
				hardCount++;
			}
			if (it.kind === 'break') {
				if (it.inserted) terms.breaks += 0.3;
				restWalk(w);
			} else if (it.kind === 'dance' || it.kind === 'walkthrough') {
				w.dancing += it.dur;
				if (w.dancing > breakLimit + EPS) {
					terms.hard += HARD + Math.min(w.dancing - breakLimit, it.dur);
					hardCount++;
				}
			} else if (it.kind === 'announcement' && !it.locked) {
				terms.filler += (it.dur / 60) * 0.5;
			}
			const c = it.cand;
			if (it.kind === 'dance' && c && c.dance >= 0) {
				if (!it.lesson) {
					const d = c.dance;
					if (sc.stamp[d] === gen && start - sc.lastStart[d] < window - EPS) {
						terms.hard += HARD;
						hardCount++;
					}
					sc.stamp[d] = gen;
					sc.lastStart[d] = start;
					if (!it.locked) {
						danceCost(problem, w, c, start, firstDance, terms);
						hist[problem.dances[d].rank]++;
					}
					advanceDance(problem, w, c);
				} else lessonPlay(problem, w, c);
				if (c.track >= 0) {
					if (sc.trackStamp[c.track] !== gen) {
						sc.trackStamp[c.track] = gen;
						sc.trackUse[c.track] = 0;
					}
					if (++sc.trackUse[c.track] > 1) {
						terms.hard += HARD;
						hardCount++;
					}
				}
				if (sc.occ === sc.occDance.length) growOcc(sc);
				const o = sc.occ++;
				sc.occDance[o] = c.dance;
				sc.occStart[o] = it.lesson ? -1 : start;
				sc.occRate[o] = c.rate;
				sc.occTrack[o] = c.track;
				if (lastSlot) {
					lastInSection.set(slot.section, it.locked ? null : c);
				}
			}
			t = end;
			lastEnd = end;
		}
		if (slot.lo > -Infinity) {
			const end = items.length ? t : slot.emptyEnd;
			if (end > slot.hi + EPS) {
				terms.hard += HARD + (end - slot.hi) * 5;
				hardCount++;
			} else if (end < slot.lo - EPS) {
				terms.hard += HARD + (slot.lo - end) * 5;
				hardCount++;
			}
		}
	}
	const n = hist[0] + hist[1] + hist[2] + hist[3] + hist[4];
	if (n > 0) {
		const mix = problem.levelMix;
		let l1 = 0;
		for (let r = 0; r < 5; r++) l1 += Math.abs(hist[r] / n - mix[r]);
		terms.difficulty += l1 * n * 0.5;
	}
	const buf = sc.buf;
	for (const r of problem.requests) {
		terms.requests += r.weight * requestCost(problem, r, startsOf(sc, r.dance, -1, buf));
	}
	for (const m of problem.must)
		if (startsOf(sc, m.dance, m.track, buf).length === 0) terms.mustPlay += 1;
	for (let i = 0; i < problem.sections.length; i++) {
		if (problem.sections[i].kind !== 'last-dance') continue;
		if (!lastInSection.has(i)) {
			terms.lastDance += 1;
			continue;
		}
		const c = lastInSection.get(i);
		if (!c) continue;
		const d = problem.dances[c.dance];
		terms.lastDance += (d.wellKnown ? 0 : 1) + Math.max(0, d.rank - 1) * 0.5;
	}
	for (const l of problem.lessons) {
		const delays: number[] = [];
		for (let i = 0; i < sc.occ; i++) {
			if (sc.occDance[i] !== l.dance || sc.occStart[i] < l.endS - EPS) continue;
			if (Math.abs(sc.occRate[i] - 1) <= s.fullTempoTolerance + EPS)
				delays.push(sc.occStart[i] - l.endS);
		}
		if (delays.length === 0) {
			terms.hard += HARD;
			hardCount++;
		} else terms.reprise += repriseCost(delays);
	}
	const weighted: ObjectiveTerms = reuse ? sc.weighted : zeroTerms();
	weighted.difficulty = wt.difficulty * terms.difficulty;
	weighted.tempo = wt.tempo * terms.tempo;
	weighted.energy = wt.energy * terms.energy;
	weighted.rhythm = wt.rhythm * terms.rhythm;
	weighted.phrasing = wt.phrasing * terms.phrasing;
	weighted.requests = wt.requests * terms.requests;
	weighted.mustPlay = wt.mustPlay * terms.mustPlay;
	weighted.lastDance = wt.lastDance * terms.lastDance;
	weighted.reprise = wt.reprise * terms.reprise;
	weighted.filler = wt.filler * terms.filler;
	weighted.breaks = wt.breaks * terms.breaks;
	weighted.formation = wt.formation * terms.formation;
	weighted.hard = terms.hard;

	const total =
		weighted.difficulty +
		weighted.tempo +
		weighted.energy +
		weighted.rhythm +
		weighted.phrasing +
		weighted.requests +
		weighted.mustPlay +
		weighted.lastDance +
		weighted.reprise +
		weighted.filler +
		weighted.breaks +
		weighted.formation +
		weighted.hard;
	return { total, terms: weighted, hardCount };
}
