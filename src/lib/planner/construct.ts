// Greedy construction: walk the night slot by slot and, at each step, add the entry with the
// lowest cost given what came before, keeping every hard rule it can see.
import { musicWindow, planBreaks, trailingBreak } from './breaks';
import { danceItem, stretchItem } from './items';
import { sizeStretch } from './layout';
import { fillFixedSlots } from './lesson';
import type { Cand, Item, Plan, Problem, Slot } from './model';
import {
	HARD,
	advanceDance,
	danceCost,
	firstDanceStart,
	newWalk,
	repriseCost,
	requestCost,
	lessonPlay,
	restWalk,
	type Walk
} from './costs';
import { restLimitS } from './settings';
import { buildSlots } from './slots';
import type { LockedEntry } from './types';

interface State {
	w: Walk;
	lastStart: Map<number, number>;
	used: Set<number>;
	/** Starts of social plays by dance. */
	plays: Map<number, number[]>;
	reprised: Set<number>;
	lockedPlays: { dance: number; start: number }[];
	firstDance: number;
}

const MIN_ANNOUNCEMENT_S = 30;

function record(problem: Problem, st: State, c: Cand, start: number): void {
	st.lastStart.set(c.dance, start);
	if (c.track >= 0) st.used.add(c.track);
	const list = st.plays.get(c.dance) ?? [];
	list.push(start);
	st.plays.set(c.dance, list);
	for (const li of problem.lessonOf[c.dance]) {
		const l = problem.lessons[li];
		if (start >= l.endS && Math.abs(c.rate - 1) <= problem.settings.fullTempoTolerance)
			st.reprised.add(l.dance);
	}
	advanceDance(problem, st.w, c);
}

/** Carries the running state over a slot whose entries are already fixed. */
function walkFixed(problem: Problem, st: State, slot: Slot, lastEnd: number): number {
	sizeStretch(problem, slot);
	let t = slot.start;
	slot.items.forEach((it, k) => {
		if (k > 0) t += problem.settings.gapS;
		if (t - lastEnd >= problem.settings.breakLengthMin * 60) restWalk(st.w);
		if (it.kind === 'break') restWalk(st.w);
		else if (it.kind === 'dance' || it.kind === 'walkthrough') st.w.dancing += it.dur;
		if (it.kind === 'dance' && it.cand && it.cand.dance >= 0) {
			if (it.lesson) {
				if (it.cand.track >= 0) st.used.add(it.cand.track);
				lessonPlay(problem, st.w, it.cand);
			} else record(problem, st, it.cand, t);
		}
		t += it.dur;
		lastEnd = t;
	});
	return slot.items.length ? t : lastEnd;
}

function tooSoon(problem: Problem, st: State, dance: number, start: number): boolean {
	const window = problem.settings.repeatWindowMin * 60;
	const last = st.lastStart.get(dance);
	if (last !== undefined && start - last < window) return true;
	for (const p of st.lockedPlays)
		if (p.dance === dance && Math.abs(p.start - start) < window) return true;
	return false;
}

/** Extra cost (negative for a gain) of a play through the evening-wide preferences. */
function globalGain(
	problem: Problem,
	st: State,
	c: Cand,
	start: number,
	lastDance: boolean
): number {
	const wt = problem.settings.weights;
	let cost = 0;
	const reqs = problem.requestsOf[c.dance];
	if (reqs.length) {
		const before = st.plays.get(c.dance) ?? [];
		const after = [...before, start];
		for (const r of reqs) {
			// With its block still ahead, a request waits for it: played now, inside the repeat
			// window, it could not come back at the block's start.
			const blockStart = r.section >= 0 ? problem.sections[r.section].startS : -Infinity;
			if (start < blockStart) {
				if (blockStart - start < problem.settings.repeatWindowMin * 60)
					cost += wt.requests * r.weight * 0.5;
				continue;
			}
			cost +=
				wt.requests * r.weight * (requestCost(problem, r, after) - requestCost(problem, r, before));
		}
	}
	const frac = start / problem.eveningS;
	for (const m of problem.mustOf[c.dance]) {
		if (m.track >= 0 && m.track !== c.track) continue;
		if (!(st.plays.get(c.dance) ?? []).length) cost -= wt.mustPlay * (0.3 + 0.7 * frac);
	}
	for (const li of problem.lessonOf[c.dance]) {
		const l = problem.lessons[li];
		if (start < l.endS || st.reprised.has(l.dance)) continue;
		if (Math.abs(c.rate - 1) > problem.settings.fullTempoTolerance) continue;
		// The first full-tempo play after the lesson settles a hard rule: take it when it comes.
		cost += -HARD / 2 + wt.reprise * repriseCost([start - l.endS]);
	}
	if (lastDance) {
		const d = problem.dances[c.dance];
		cost += wt.lastDance * ((d.wellKnown ? 0 : 1) + Math.max(0, d.rank - 1) * 0.5);
	}
	return cost;
}

/** Whether what is left, [lo, hi] seconds, can still be filled: room for two entries or more,
 * or some single playable duration that lands in it (sorted `durs`, by binary search). */
function closable(
	durs: Float64Array,
	lo: number,
	hi: number,
	minDur: number,
	gap: number
): boolean {
	if (hi < minDur) return false;
	if (hi >= 2 * minDur + gap) return true;
	let a = 0;
	let b = durs.length;
	while (a < b) {
		const m = (a + b) >> 1;
		if (durs[m] < lo) a = m + 1;
		else b = m;
	}
	return a < durs.length && durs[a] <= hi;
}

interface Pick {
	cand: Cand;
	cost: number;
}

/** The cheapest playable entry that starts at `start`: it must end by the slot's latest end and
 * either inside the slot's window (better near its middle) or with room for another after it. */
export function bestPick(
	problem: Problem,
	st: State,
	slot: Slot,
	start: number,
	minRoom: number,
	durs: Float64Array
): Pick | null {
	const s = problem.settings;
	const limit = restLimitS(s) - st.w.dancing;
	const lastDance = problem.sections[slot.section]?.kind === 'last-dance';
	const mid = (slot.lo + slot.hi) / 2;
	const half = Math.max(1, (slot.hi - slot.lo) / 2);
	let best: Pick | null = null;
	for (const d of problem.playable) {
		if (tooSoon(problem, st, d, start)) continue;
		const dance = problem.dances[d];
		if (dance.rank === 4 && st.w.advRun >= 2) continue;
		const wantsReprise = problem.lessonOf[d].some(
			(li) => start >= problem.lessons[li].endS && !st.reprised.has(d)
		);
		for (const list of wantsReprise ? [dance.full, dance.cands] : [dance.cands]) {
			let found: Cand | null = null;
			let timing = 0;
			for (const c of list) {
				if (st.used.has(c.track) || c.dur > limit) continue;
				const end = start + c.dur;
				if (end > slot.hi) continue;
				if (end < slot.lo) {
					if (!closable(durs, slot.lo - end - s.gapS, slot.hi - end - s.gapS, minRoom, s.gapS))
						continue;
				} else timing = Math.abs(end - mid) / half;
				found = c;
				break;
			}
			if (!found) continue;
			const cost =
				danceCost(problem, st.w, found, start, st.firstDance, null) +
				globalGain(problem, st, found, start, lastDance) +
				timing;
			if (!best || cost < best.cost) best = { cand: found, cost };
			break;
		}
	}
	return best;
}

function fillDanceSlot(
	problem: Problem,
	st: State,
	slot: Slot,
	durs: Float64Array,
	lastEnd: number
): number {
	const minDur = durs.length ? durs[0] : Infinity;
	const s = problem.settings;
	const win = musicWindow(problem, slot);
	const tail = trailingBreak(slot);
	const music: Item[] = [];
	const view: Slot = { ...slot, lo: win.lo, hi: win.hi, items: music };
	let end = slot.start;
	if (slot.start - lastEnd >= s.breakLengthMin * 60) restWalk(st.w);
	for (let guard = 0; guard < 500; guard++) {
		if (music.length > 0 && end >= win.lo) break;
		const start = music.length ? end + s.gapS : slot.start;
		const pick = bestPick(problem, st, view, start, minDur, durs);
		if (!pick) {
			if (!tail && end < win.lo && win.lo - start <= s.announcementMaxS) {
				music.push(stretchItem('announcement', MIN_ANNOUNCEMENT_S, s.announcementMaxS));
				sizeStretch(problem, view);
				end = start + music[music.length - 1].dur;
			}
			break;
		}
		music.push(danceItem(pick.cand));
		st.w.dancing += pick.cand.dur;
		record(problem, st, pick.cand, start);
		end = start + pick.cand.dur;
	}
	slot.items = tail ? [...music, tail] : music;
	if (tail) {
		restWalk(st.w);
		return slot.target;
	}
	return music.length ? end : lastEnd;
}

/** Every playable duration, sorted: what the greedy can still close a slot with. */
function durations(problem: Problem): Float64Array {
	const out: number[] = [];
	for (const d of problem.playable) for (const c of problem.dances[d].cands) out.push(c.dur);
	return Float64Array.from(out).sort();
}

export function construct(problem: Problem, locks: LockedEntry[]): Plan {
	const slots = buildSlots(problem, locks);
	const used = fillFixedSlots(problem, slots);
	const plan = planBreaks(problem, slots);
	const lockedPlays: State['lockedPlays'] = [];
	for (const s of plan) {
		for (const it of s.items) {
			if (it.locked && !it.lesson && it.kind === 'dance' && it.cand && it.cand.dance >= 0) {
				lockedPlays.push({ dance: it.cand.dance, start: s.start });
			}
		}
	}
	const st: State = {
		w: newWalk(),
		lastStart: new Map(),
		used,
		plays: new Map(),
		reprised: new Set(),
		lockedPlays,
		firstDance: firstDanceStart(problem, plan)
	};
	const durs = durations(problem);
	let lastEnd = 0;
	for (const slot of plan) {
		if (slot.kind === 'fixed') lastEnd = walkFixed(problem, st, slot, lastEnd);
		else lastEnd = fillDanceSlot(problem, st, slot, durs, lastEnd);
	}
	return plan;
}
