// The run order being edited in the browser: entries in order, their computed start times, and
// the edits (move, insert, remove, lock, swap). Saving and planning live in the editor component.
import type { EntryKind, Formation, Level, Rhythm } from '../../domain';
import {
	DEFAULT_DURATION_S,
	recomputeStarts,
	sectionAfterMove,
	type SectionStart
} from '$lib/run-order/timing';

export interface DraftEntry {
	/** A key for the list and the drag-and-drop zone; not the database id. */
	id: number;
	kind: EntryKind;
	sectionId: number | null;
	danceId: number | null;
	danceName: string | null;
	danceLevel: Level | null;
	danceRhythm: Rhythm | null;
	danceFormation: Formation | null;
	trackId: number | null;
	trackTitle: string | null;
	trackArtist: string | null;
	trackBpm: number | null;
	/** The track's own length; a dance lasts trackS ÷ rate. */
	trackS: number | null;
	rate: number;
	durationS: number;
	locked: boolean;
	/** Where a locked entry is pinned (seconds from the evening's start). */
	pinS: number | null;
	text: string;
	reasons: string[];
}

/** What the server sends for an entry (saved run order or a plan's proposal). */
export type EntryData = Partial<Omit<DraftEntry, 'id' | 'trackS' | 'pinS'>> & {
	kind: EntryKind;
	startS?: number;
	title?: string;
};

let seq = 0;

export function toDraft(e: EntryData): DraftEntry {
	const rate = e.rate ?? 1;
	const durationS = e.durationS ?? DEFAULT_DURATION_S[e.kind];
	return {
		id: ++seq,
		kind: e.kind,
		sectionId: e.sectionId ?? null,
		danceId: e.danceId ?? null,
		danceName: e.danceName ?? null,
		danceLevel: e.danceLevel ?? null,
		danceRhythm: e.danceRhythm ?? null,
		danceFormation: e.danceFormation ?? null,
		trackId: e.trackId ?? null,
		trackTitle: e.trackTitle ?? null,
		trackArtist: e.trackArtist ?? null,
		trackBpm: e.trackBpm ?? null,
		trackS: e.trackId != null ? durationS * rate : null,
		rate,
		durationS,
		locked: e.locked ?? false,
		pinS: e.locked ? (e.startS ?? null) : null,
		text: e.text ?? e.title ?? '',
		reasons: e.reasons ?? []
	};
}

/** The body of a save or a planning request. */
export const toSave = (e: DraftEntry) => ({
	kind: e.kind,
	sectionId: e.sectionId,
	danceId: e.danceId,
	trackId: e.trackId,
	rate: e.rate,
	durationS: e.durationS,
	locked: e.locked,
	...(e.locked && e.pinS != null ? { startS: e.pinS } : {}),
	text: e.text,
	reasons: e.reasons
});

/** How many steps back undo reaches. */
const MAX_UNDO = 100;

interface Snapshot {
	entries: DraftEntry[];
	dirty: boolean;
}

export class RunOrderDraft {
	entries = $state<DraftEntry[]>([]);
	/** True once the person changed something since the last load or save. */
	dirty = $state(false);
	/** Earlier states for undo (most recent last) and undone ones for redo; a load or a save
	 * starts both afresh. */
	private past = $state<Snapshot[]>([]);
	private future = $state<Snapshot[]>([]);
	/** The entry last retyped: a run of typing in one entry is one step to undo. */
	private typing: string | null = null;
	canUndo = $derived(this.past.length > 0);
	canRedo = $derived(this.future.length > 0);
	private sections: () => SectionStart[];
	private gapS: () => number;
	/** Start of every entry in seconds from the evening's start, as a save would compute it. */
	starts = $derived.by(() => this.computeStarts());

	private computeStarts(): number[] {
		return recomputeStarts(
			this.entries.map((e) => ({ ...e, startS: e.pinS })),
			this.sections(),
			this.gapS()
		);
	}

	/** Where entry `index` starts now, computed afresh (not from a derived value mid-update). */
	private startOf(index: number): number | null {
		return this.computeStarts()[index] ?? null;
	}

	constructor(initial: EntryData[], sections: () => SectionStart[], gapS: () => number) {
		this.sections = sections;
		this.gapS = gapS;
		this.entries = initial.map(toDraft);
	}

	private snapshot(): Snapshot {
		return { entries: $state.snapshot(this.entries) as DraftEntry[], dirty: this.dirty };
	}

	/** Called before each change, so that undo goes back to the state before it. */
	private remember(typing: string | null = null) {
		if (typing === null || typing !== this.typing) {
			this.past = [...this.past.slice(-(MAX_UNDO - 1)), this.snapshot()];
		}
		this.typing = typing;
		this.future = [];
	}

	private restore(s: Snapshot) {
		this.entries = s.entries;
		this.dirty = s.dirty;
		this.typing = null;
	}

	undo() {
		const before = this.past.at(-1);
		if (!before) return;
		this.future = [...this.future, this.snapshot()];
		this.past = this.past.slice(0, -1);
		this.restore(before);
	}

	redo() {
		const after = this.future.at(-1);
		if (!after) return;
		this.past = [...this.past, this.snapshot()];
		this.future = this.future.slice(0, -1);
		this.restore(after);
	}

	/** A new run order: a proposal (`dirty`, and undoable) or what was loaded or saved. */
	replace(list: EntryData[], dirty: boolean) {
		if (dirty) this.remember();
		else {
			this.past = [];
			this.future = [];
			this.typing = null;
		}
		this.entries = list.map(toDraft);
		this.dirty = dirty;
	}

	/** After a drag: the new order; the moved entry joins its new neighbours' section. */
	reorder(list: DraftEntry[], movedId?: number) {
		this.remember();
		this.entries = list;
		const at = list.findIndex((e) => e.id === movedId);
		if (at >= 0) this.settle(at);
		this.dirty = true;
	}

	private settle(at: number) {
		const e = this.entries[at];
		e.sectionId = sectionAfterMove(this.entries, at);
		// A moved lock is pinned again where it now lands.
		e.pinS = null;
		if (e.locked) e.pinS = this.startOf(at);
	}

	move(index: number, by: -1 | 1) {
		const to = index + by;
		if (to < 0 || to >= this.entries.length) return;
		this.remember();
		const list = [...this.entries];
		[list[index], list[to]] = [list[to], list[index]];
		this.entries = list;
		this.settle(to);
		this.dirty = true;
	}

	insert(at: number, data: EntryData) {
		this.remember();
		const list = [...this.entries];
		const entry = toDraft(data);
		entry.sectionId = data.sectionId ?? list[at - 1]?.sectionId ?? list[at]?.sectionId ?? null;
		list.splice(at, 0, entry);
		this.entries = list;
		this.dirty = true;
		return entry;
	}

	remove(index: number) {
		this.remember();
		this.entries = this.entries.filter((_, i) => i !== index);
		this.dirty = true;
	}

	toggleLock(index: number) {
		this.remember();
		const e = this.entries[index];
		const start = this.startOf(index);
		e.locked = !e.locked;
		e.pinS = e.locked ? start : null;
		this.dirty = true;
	}

	swapTrack(
		index: number,
		t: {
			trackId: number;
			title: string;
			artist: string;
			bpm: number | null;
			durationS: number;
			rate: number;
		}
	) {
		this.remember();
		const e = this.entries[index];
		e.trackId = t.trackId;
		e.trackTitle = t.title;
		e.trackArtist = t.artist;
		e.trackBpm = t.bpm;
		e.trackS = t.durationS;
		e.rate = t.rate;
		e.durationS = t.durationS / t.rate;
		e.reasons = ['track chosen by hand from the fit ranking'];
		this.dirty = true;
	}

	setRate(index: number, rate: number) {
		const e = this.entries[index];
		if (!(rate >= 0.5 && rate <= 2)) return;
		this.remember();
		e.rate = rate;
		if (e.trackS != null) e.durationS = e.trackS / rate;
		this.dirty = true;
	}

	setText(index: number, text: string) {
		this.remember(`text ${this.entries[index].id}`);
		this.entries[index].text = text;
		this.dirty = true;
	}
}
