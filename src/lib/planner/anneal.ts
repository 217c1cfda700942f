// Simulated annealing over the dancing slots: swap two dances, move an entry (or a break) within
// its slot, replace a track with another that fits the same dance, or replace a dance with
// another of similar length. The iteration count is the binding, deterministic limit; the wall
// clock is only a safety net.
import { musicEnd, musicWindow, trailingBreak } from './breaks';
import { danceItem, stretchItem } from './items';
import type { Cand, Item, Plan, Problem } from './model';
import { clonePlan } from './model';
import { evaluate, evaluateTotal } from './objective';
import type { Rng } from './rng';

export interface AnnealResult {
	plan: Plan;
	total: number;
	iterations: number;
	stoppedBy: 'iterations' | 'time';
}

const T_START = 1;
const T_END = 0.02;
const SAMPLE = 12;

interface Ctx {
	problem: Problem;
	plan: Plan;
	rng: Rng;
	used: Uint8Array;
	danceSlots: number[];
}

const movable = (it: Item) => it.kind === 'dance' && !it.locked && !it.lesson && it.cand !== null;

function pickItem(ctx: Ctx): { s: number; i: number } | null {
	const { plan, rng, danceSlots } = ctx;
	for (let tries = 0; tries < 8; tries++) {
		const s = danceSlots[rng.int(danceSlots.length)];
		const items = plan[s].items;
		if (items.length === 0) continue;
		const i = rng.int(items.length);
		if (movable(items[i])) return { s, i };
	}
	return null;
}

/** Of a few sampled pairings, the unused one closest in length to `dur`. */
function closest(ctx: Ctx, list: Cand[], dur: number, exclude: number): Cand | null {
	if (list.length === 0) return null;
	let best: Cand | null = null;
	const n = Math.min(SAMPLE, list.length);
	for (let k = 0; k < n; k++) {
		const c = list.length <= SAMPLE ? list[k] : list[ctx.rng.int(list.length)];
		if (c.track === exclude || ctx.used[c.track]) continue;
		if (!best || Math.abs(c.dur - dur) < Math.abs(best.dur - dur)) best = c;
	}
	return best;
}

type Undo = () => void;

/** A playable dance, its level drawn from the crowd's wanted mix half of the time, so that the
 * search tries the levels the evening needs rather than whatever the catalogue holds most of. */
function randomDance(ctx: Ctx): number {
	const { problem, rng } = ctx;
	if (rng.next() < 0.5) {
		let u = rng.next();
		for (let r = 0; r < 5; r++) {
			u -= problem.levelMix[r];
			const pool = problem.playableByRank[r];
			if (u < 0 && pool.length) return pool[rng.int(pool.length)];
		}
	}
	return problem.playable[rng.int(problem.playable.length)];
}

/** A length for a replacement that moves the slot's end part of the way towards the middle of
 * its window, so that replacements keep the timing rule and re-centre it over time. */
function wantedDur(ctx: Ctx, s: number, dur: number): number {
	const slot = ctx.plan[s];
	const win = musicWindow(ctx.problem, slot);
	return dur + ((win.lo + win.hi) / 2 - musicEnd(ctx.problem, slot)) * ctx.rng.next();
}

function replaceWith(ctx: Ctx, s: number, i: number, c: Cand): Undo {
	const items = ctx.plan[s].items;
	const old = items[i];
	const oldTrack = old.cand!.track;
	items[i] = danceItem(c);
	ctx.used[oldTrack] = 0;
	ctx.used[c.track] = 1;
	return () => {
		items[i] = old;
		ctx.used[c.track] = 0;
		ctx.used[oldTrack] = 1;
	};
}

function propose(ctx: Ctx): Undo | null {
	const { problem, plan, rng } = ctx;
	const r = rng.next();
	if (r < 0.3) {
		const a = pickItem(ctx);
		const b = pickItem(ctx);
		if (!a || !b || (a.s === b.s && a.i === b.i)) return null;
		const A = plan[a.s].items;
		const B = plan[b.s].items;
		const x = A[a.i];
		A[a.i] = B[b.i];
		B[b.i] = x;
		return () => {
			B[b.i] = A[a.i];
			A[a.i] = x;
		};
	}
	if (r < 0.5) {
		const s = ctx.danceSlots[rng.int(ctx.danceSlots.length)];
		const items = plan[s].items;
		// The planned break stays last in its slot.
		const n = items.length - (trailingBreak(plan[s]) ? 1 : 0);
		if (n < 2) return null;
		const from = rng.int(n);
		if (items[from].stretch) return null;
		const to = rng.int(n);
		if (to === from) return null;
		const saved = items.slice();
		const [it] = items.splice(from, 1);
		items.splice(to, 0, it);
		return () => {
			items.length = 0;
			items.push(...saved);
		};
	}
	if (r < 0.75) {
		const a = pickItem(ctx);
		if (!a) return null;
		const cur = plan[a.s].items[a.i].cand!;
		const dance = problem.dances[cur.dance];
		const list = rng.next() < 0.5 && dance.full.length ? dance.full : dance.cands;
		const c = closest(ctx, list, wantedDur(ctx, a.s, cur.dur), cur.track);
		return c ? replaceWith(ctx, a.s, a.i, c) : null;
	}
	if (r < 0.97) {
		const a = pickItem(ctx);
		if (!a || problem.playable.length === 0) return null;
		const cur = plan[a.s].items[a.i].cand!;
		const d = randomDance(ctx);
		if (d === cur.dance) return null;
		const c = closest(ctx, problem.dances[d].cands, wantedDur(ctx, a.s, cur.dur), -1);
		return c ? replaceWith(ctx, a.s, a.i, c) : null;
	}
	// Add or remove the announcement that closes a gap the music cannot.
	const s = ctx.danceSlots[rng.int(ctx.danceSlots.length)];
	if (trailingBreak(plan[s])) return null;
	const items = plan[s].items;
	const at = items.findIndex((it) => it.kind === 'announcement' && it.stretch);
	if (at >= 0) {
		const [it] = items.splice(at, 1);
		return () => items.splice(at, 0, it);
	}
	const { announcementMaxS } = problem.settings;
	items.push(stretchItem('announcement', 30, announcementMaxS));
	return () => void items.pop();
}

export function anneal(
	problem: Problem,
	start: Plan,
	rng: Rng,
	iterations: number,
	timeBudgetMs: number
): AnnealResult {
	const plan = clonePlan(start);
	const used = new Uint8Array(problem.tracks.length);
	for (const s of plan)
		for (const it of s.items) if (it.cand && it.cand.track >= 0) used[it.cand.track] = 1;
	const danceSlots = plan.map((s, i) => (s.kind === 'dance' ? i : -1)).filter((i) => i >= 0);
	let cur = evaluate(problem, plan).total;
	let best = clonePlan(plan);
	let bestTotal = cur;
	if (danceSlots.length === 0 || iterations <= 0) {
		return { plan: best, total: bestTotal, iterations: 0, stoppedBy: 'iterations' };
	}
	const ctx: Ctx = { problem, plan, rng, used, danceSlots };
	const t0 = performance.now();
	// Geometric cooling from T_START to T_END over the iteration budget.
	const cool = Math.pow(T_END / T_START, 1 / iterations);
	let temp = T_START;
	let it = 0;
	let stoppedBy: AnnealResult['stoppedBy'] = 'iterations';
	for (; it < iterations; it++) {
		if ((it & 127) === 0 && performance.now() - t0 > timeBudgetMs) {
			stoppedBy = 'time';
			break;
		}
		temp *= cool;
		const undo = propose(ctx);
		if (!undo) continue;
		const next = evaluateTotal(problem, plan);
		const delta = next - cur;
		if (delta <= 0 || rng.next() < Math.exp(-delta / temp)) {
			cur = next;
			if (cur < bestTotal - 1e-9) {
				bestTotal = cur;
				best = clonePlan(plan);
			}
		} else undo();
	}
	return { plan: best, total: bestTotal, iterations: it, stoppedBy };
}
