// The planner's working model: input indexed into arrays, and the plan as slots of items.
// Internal to the planner; the public shapes are in types.ts.
import type { CrowdMix, EntryKind, SectionKind } from '../domain';
import type { Id, LockedEntryData, PlanSettings } from './types';

/** One playable pairing: a track for a dance at a rate, with its duration on the floor. */
export interface Cand {
	dance: number;
	track: number;
	rate: number;
	/** Track duration ÷ rate. */
	dur: number;
	score: number;
	/** Effective tempo, bpm × rate (0 when the track has no tempo). */
	eff: number;
	marked: boolean;
	/** The team's lesson rate (< 1) for this pairing, if any. */
	lessonRate: number | null;
}

export interface DanceInfo {
	id: Id;
	name: string;
	rank: number;
	rhythm: string;
	wellKnown: boolean;
	/** A partner (couple) dance: spaced by the formation rule. Circle dances count as line. */
	partner: boolean;
	bpmMin: number;
	bpmMax: number;
	/** Counts in one repetition of the dance. */
	counts: number;
	/** Playable pairings, best score first. */
	cands: Cand[];
	/** Pairings at full tempo (rate ≈ 1), for the reprise after a lesson. */
	full: Cand[];
}

export interface TrackInfo {
	id: Id;
	title: string;
	artist: string;
	durationS: number;
	bpm: number | null;
}

export interface SectionInfo {
	id: Id;
	kind: SectionKind;
	startS: number;
	endS: number;
	title?: string;
	/** Lesson dance index, or -1. */
	dance: number;
}

export interface Item {
	kind: EntryKind;
	/** The pairing for a dance entry. */
	cand: Cand | null;
	dur: number;
	locked: boolean;
	lock?: { position: number; data: LockedEntryData; dance: number; track: number };
	/** Length decided at layout, to fill the slot. */
	stretch: boolean;
	minDur: number;
	maxDur: number;
	/** The lesson's own play of its dance at lesson tempo. */
	lesson: boolean;
	/** Break added by the planner inside a dancing section. */
	inserted: boolean;
}

export type SlotKind = 'dance' | 'fixed';

export interface Slot {
	kind: SlotKind;
	section: number;
	start: number;
	/** The entries must end within [lo, hi]. */
	lo: number;
	hi: number;
	/** Where a stretching entry (teach, break section) aims to end. */
	target: number;
	/** Where the run order stands if the slot stays empty: the end of what came before it. */
	emptyEnd: number;
	items: Item[];
}

export interface RequestInfo {
	dance: number;
	/** Target section index, or -1 for anywhere. */
	section: number;
	weight: number;
	/** Accepted by the team: best early in its block. */
	first: boolean;
}

export interface MustInfo {
	dance: number;
	track: number;
}

export interface Problem {
	settings: PlanSettings;
	crowd: CrowdMix;
	/** Evening length in seconds (at least 1). */
	eveningS: number;
	/** Wanted share of dances by level rank, for this crowd. */
	levelMix: number[];
	/** Cost of one dance at each level rank for this crowd: 0 for the most wanted level. */
	levelCost: number[];
	dances: DanceInfo[];
	tracks: TrackInfo[];
	sections: SectionInfo[];
	/** Dances with at least one playable pairing, in catalogue order. */
	playable: number[];
	/** Some partner dance can be played: only then is the night's formation mix asked for. */
	havePartner: boolean;
	/** Playable dances by level rank. */
	playableByRank: number[][];
	/** By dance: requests for it, must-plays naming it, lessons teaching it. */
	requestsOf: RequestInfo[][];
	mustOf: MustInfo[][];
	lessonOf: number[][];
	requests: RequestInfo[];
	must: MustInfo[];
	lessons: { section: number; dance: number; endS: number }[];
	/** Problems found while reading the input, in plain words. */
	inputNotes: string[];
	/** Hard-rule conflicts already known from the input (e.g. overlapping locks). */
	inputViolations: string[];
	danceIndex: Map<Id, number>;
	trackIndex: Map<Id, number>;
}

export type Plan = Slot[];

export function clonePlan(plan: Plan): Plan {
	return plan.map((s) => ({ ...s, items: s.items.slice() }));
}
