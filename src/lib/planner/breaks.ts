// Plans the breaks before any music is chosen: walking the night, wherever the dancing since the
// last rest would pass the limit, a dancing slot is cut so that it ends in a break. The break
// stretches (from its set length up to the end tolerance longer) to absorb the slack of the music
// before it, and the rest of the slot becomes a new slot. Counting clock time rather than music
// keeps the rule with room to spare.
import { stretchItem } from './items';
import { sizeStretch } from './layout';
import type { Item, Plan, Problem, Slot } from './model';
import { restLimitS } from './settings';

/** The trailing break of a slot, if the planner put one there. */
export function trailingBreak(slot: Slot): Item | null {
	const last = slot.items[slot.items.length - 1];
	return last && last.kind === 'break' && last.stretch && last.inserted ? last : null;
}

/** Where the music of a dancing slot must end: before its trailing break, or the slot's window. */
export function musicWindow(problem: Problem, slot: Slot): { lo: number; hi: number } {
	const br = trailingBreak(slot);
	if (!br) return { lo: slot.lo, hi: slot.hi };
	const gap = problem.settings.gapS;
	return { lo: slot.target - gap - br.maxDur, hi: slot.target - gap - br.minDur };
}

/** Where the music of a dancing slot ends (its start when it has none). */
export function musicEnd(problem: Problem, slot: Slot): number {
	const n = slot.items.length - (trailingBreak(slot) ? 1 : 0);
	if (n <= 0) return slot.start;
	let t = slot.start + problem.settings.gapS * (n - 1);
	for (let i = 0; i < n; i++) t += slot.items[i].dur;
	return t;
}

function breakItem(minDur: number, maxDur: number): Item {
	const it = stretchItem('break', minDur, maxDur);
	it.inserted = true;
	return it;
}

/** The shortest stretch worth leaving after a break: about one track. */
const SCRAP_S = 240;

export function planBreaks(problem: Problem, plan: Plan): Plan {
	const s = problem.settings;
	const limit = restLimitS(s);
	// Off: the evening's own sections hold every rest.
	if (limit === Infinity) return plan;
	const len = s.breakLengthMin * 60;
	const tol = s.endToleranceS;
	const gap = s.gapS;
	const out: Plan = [];
	let acc = 0;
	let lastEnd = 0;
	// Dancing in the fixed slots right after each slot (locked dances, say), before any rest: a
	// break must come before them if they would pass the limit.
	const ahead = plan.map((_, i) => {
		let sum = 0;
		for (let j = i + 1; j < plan.length && plan[j].kind === 'fixed'; j++) {
			for (const it of plan[j].items) {
				if (it.kind === 'break') return sum;
				if (it.kind === 'dance' || it.kind === 'walkthrough') sum += it.dur;
			}
		}
		return sum;
	});
	for (const [index, slot] of plan.entries()) {
		if (slot.start - lastEnd >= len) acc = 0;
		if (slot.kind === 'fixed') {
			sizeStretch(problem, slot);
			let t = slot.start;
			slot.items.forEach((it, k) => {
				if (k > 0) t += gap;
				if (it.kind === 'break') acc = 0;
				else if (it.kind === 'dance' || it.kind === 'walkthrough') acc += it.dur;
				t += it.dur;
			});
			lastEnd = slot.items.length ? t : lastEnd;
			out.push(slot);
			continue;
		}
		let cur = slot;
		for (let guard = 0; guard < 100; guard++) {
			const span = cur.hi - cur.start;
			const later = ahead[index];
			if (acc + span + later <= limit) {
				acc += span;
				out.push(cur);
				lastEnd = cur.hi;
				break;
			}
			if (cur.target - cur.start < len + gap + 60) {
				// Too short to hold music and a break: the slot becomes the rest.
				cur.items.push(breakItem(0, Infinity));
				cur.lo = cur.hi = cur.target;
				out.push(cur);
				acc = 0;
				lastEnd = cur.target;
				break;
			}
			// Music may end no later than the limit allows; the break follows.
			let musicEnd = Math.max(cur.start, cur.start + (limit - acc));
			let breakEnd = musicEnd + gap + len;
			// A break that would leave only a scrap of the slot after it comes earlier, so that some
			// dancing follows it; if the slot has no room for that, the break ends the slot.
			if (breakEnd > cur.target - gap - SCRAP_S) {
				const earlier = cur.target - gap - SCRAP_S;
				breakEnd = earlier - gap - len >= cur.start ? earlier : cur.target;
				musicEnd = breakEnd - gap - len;
			}
			const head: Slot = {
				...cur,
				lo: breakEnd,
				hi: breakEnd,
				target: breakEnd,
				items: [breakItem(len, len + tol)]
			};
			out.push(head);
			acc = 0;
			lastEnd = breakEnd;
			if (cur.target - breakEnd - gap <= 1) break;
			cur = { ...cur, start: breakEnd + gap, emptyEnd: breakEnd, items: [] };
			cur.lo = Math.max(cur.lo, breakEnd);
		}
	}
	return out;
}
