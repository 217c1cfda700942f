// Lays a plan out in time: the start of every item, and the length of each stretching item.
import type { Item, Plan, Problem, Slot } from './model';

/** Sets the length of the slot's stretching item (if any) so the slot ends where it should:
 * a teach or break section at its target, an added announcement just inside the window. */
export function sizeStretch(problem: Problem, slot: Slot): void {
	let stretch: Item | null = null;
	let others = 0;
	for (const it of slot.items) {
		if (it.stretch) stretch = it;
		else others += it.dur;
	}
	if (!stretch) return;
	const gaps = problem.settings.gapS * (slot.items.length - 1);
	const aim = stretch.kind === 'announcement' ? slot.lo : slot.target;
	const want = aim - slot.start - others - gaps;
	stretch.dur = Math.min(stretch.maxDur, Math.max(stretch.minDur, want));
}

export interface Placed {
	item: Item;
	slot: Slot;
	start: number;
}

/** Every item in time order with its start. */
export function place(problem: Problem, plan: Plan): Placed[] {
	const out: Placed[] = [];
	const gap = problem.settings.gapS;
	for (const slot of plan) {
		sizeStretch(problem, slot);
		let t = slot.start;
		slot.items.forEach((item, k) => {
			if (k > 0) t += gap;
			if (item.inserted && item.stretch && t < slot.target - item.dur) t = slot.target - item.dur;
			out.push({ item, slot, start: t });
			t += item.dur;
		});
	}
	return out;
}

/** Where a slot's entries end (its start when empty). */
export function slotEnd(problem: Problem, slot: Slot): number {
	if (slot.items.length === 0) return slot.emptyEnd;
	let t = slot.start + problem.settings.gapS * (slot.items.length - 1);
	for (const it of slot.items) t += it.dur;
	const last = slot.items[slot.items.length - 1];
	return last.inserted && last.stretch ? Math.max(t, slot.target) : t;
}
