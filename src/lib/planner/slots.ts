// Cuts the evening into slots: the free stretches of each section between locked entries, each
// with the window its entries must end in, and one fixed slot per locked entry.
import type { Cand, Item, Problem, Slot } from './model';
import type { LockedEntry } from './types';

function lockItem(problem: Problem, lock: LockedEntry): Item {
	const e = lock.entry;
	const d = e.danceId == null ? -1 : (problem.danceIndex.get(e.danceId) ?? -1);
	const t = e.trackId == null ? -1 : (problem.trackIndex.get(e.trackId) ?? -1);
	const rate = e.rate && e.rate > 0 ? e.rate : 1;
	let cand: Cand | null = null;
	if (e.kind === 'dance' && d >= 0) {
		const known = problem.dances[d].cands.find((c) => c.track === t);
		if (!known) {
			problem.inputNotes.push(
				`The locked entry at position ${lock.position + 1} plays a track that is not a playable fit for ${problem.dances[d].name} (or is on the never-play list); it stays because it is locked.`
			);
		}
		const bpm = t >= 0 ? problem.tracks[t].bpm : null;
		cand = {
			dance: d,
			track: t,
			rate,
			dur: e.durationS,
			score: known?.score ?? 0,
			eff: bpm ? bpm * rate : 0,
			marked: known?.marked ?? false,
			lessonRate: null
		};
	}
	return {
		kind: e.kind,
		cand,
		dur: Math.max(0, e.durationS),
		locked: true,
		lock: { position: lock.position, data: e, dance: d, track: t },
		stretch: false,
		minDur: e.durationS,
		maxDur: e.durationS,
		lesson: false,
		inserted: false
	};
}

/** Locks in time order, dropping any that overlap an earlier one (reported as a violation). */
function orderLocks(problem: Problem, locks: LockedEntry[]): LockedEntry[] {
	const sorted = locks
		.map((l, i) => ({ l, i }))
		.sort((a, b) => a.l.startS - b.l.startS || a.l.position - b.l.position || a.i - b.i)
		.map((x) => x.l);
	const kept: LockedEntry[] = [];
	let end = -Infinity;
	for (const l of sorted) {
		// A hair of tolerance: a lock that starts as the one before ends, to rounding, does not overlap.
		if (l.startS < end - 1e-6) {
			problem.inputViolations.push(
				`The locked entry at position ${l.position + 1} overlaps the locked entry before it, so it was left out.`
			);
			continue;
		}
		if (l.startS + l.entry.durationS > problem.eveningS + 1e-6) {
			problem.inputViolations.push(
				`The locked entry at position ${l.position + 1} runs past the end of the evening.`
			);
		}
		kept.push(l);
		end = l.startS + l.entry.durationS;
	}
	return kept;
}

export function buildSlots(problem: Problem, locks: LockedEntry[]): Slot[] {
	const { gapS, endToleranceS: tol } = problem.settings;
	const ordered = orderLocks(problem, locks);
	const slots: Slot[] = [];
	const secs = problem.sections;
	// The section a lock starts in; at a boundary the later section; between sections the earlier.
	const sectionOf = (t: number) => {
		const inside = secs.findIndex((s) => t >= s.startS && t < s.endS);
		if (inside >= 0) return inside;
		let prev = -1;
		secs.forEach((s, i) => {
			if (s.startS <= t) prev = i;
		});
		return prev;
	};
	const lockSlots: Slot[] = ordered.map((l) => ({
		kind: 'fixed',
		section: sectionOf(l.startS),
		start: l.startS,
		lo: -Infinity,
		hi: Infinity,
		target: l.startS + l.entry.durationS,
		emptyEnd: l.startS,
		items: [lockItem(problem, l)]
	}));
	let cursor = 0;
	let li = 0;
	let lastLockEnd = 0;
	secs.forEach((sec, si) => {
		// The next section's first entry comes after the changeover, as the saved run order lays
		// it out; the evening's own end needs none.
		const nextSec = si + 1 < secs.length ? secs[si + 1].startS - gapS : problem.eveningS;
		// What the section follows: its own start, or a lock from before that runs into it.
		let before = cursor > sec.startS ? lastLockEnd : sec.startS;
		cursor = Math.max(cursor, sec.startS);
		const kind = sec.kind === 'lesson' || sec.kind === 'break' ? 'fixed' : 'dance';
		for (;;) {
			const lock = li < lockSlots.length ? lockSlots[li] : null;
			if (lock && lock.start < sec.endS) {
				// Room before the lock gets a slot; a lock right after the one before gets none.
				if (lock.start - gapS > cursor) {
					const hi = lock.start - gapS;
					slots.push({
						kind,
						section: si,
						start: cursor,
						lo: Math.max(before, hi - tol),
						hi,
						target: hi,
						emptyEnd: before,
						items: []
					});
				}
				slots.push(lock);
				cursor = Math.max(cursor, lock.target + gapS);
				before = Math.max(before, lock.target);
				lastLockEnd = Math.max(lastLockEnd, lock.target);
				li++;
				continue;
			}
			const nextLock = lock ? lock.start - gapS : Infinity;
			const hi = Math.min(sec.endS + tol, nextSec, nextLock, problem.eveningS);
			const target = Math.min(sec.endS, hi);
			if (hi >= cursor && target - cursor > 1) {
				slots.push({
					kind,
					section: si,
					start: cursor,
					lo: Math.max(before, Math.min(target, sec.endS - tol)),
					hi,
					target,
					emptyEnd: before,
					items: []
				});
			}
			break;
		}
		cursor = Math.max(cursor, sec.endS);
	});
	while (li < lockSlots.length) slots.push(lockSlots[li++]);
	slots.sort((a, b) => a.start - b.start);
	return slots;
}
