// Constructors for the items a plan is made of.
import type { EntryKind } from '../domain';
import type { Cand, Item } from './model';

export function danceItem(cand: Cand, lesson = false): Item {
	return {
		kind: 'dance',
		cand,
		dur: cand.dur,
		locked: false,
		stretch: false,
		minDur: cand.dur,
		maxDur: cand.dur,
		lesson,
		inserted: false
	};
}

/** An entry whose length is set at layout so that its slot ends where it should. */
export function stretchItem(kind: EntryKind, minDur: number, maxDur = Infinity): Item {
	return {
		kind,
		cand: null,
		dur: minDur,
		locked: false,
		stretch: true,
		minDur,
		maxDur,
		lesson: false,
		inserted: false
	};
}

export function fixedItem(kind: EntryKind, dur: number, inserted = false): Item {
	return {
		kind,
		cand: null,
		dur,
		locked: false,
		stretch: false,
		minDur: dur,
		maxDur: dur,
		lesson: false,
		inserted
	};
}
