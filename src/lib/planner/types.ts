// The planner's public input and output. Plain data: the routes map database rows to these and
// the planner never reads the database itself.
import type {
	CrowdMix,
	EntryKind,
	Formation,
	Level,
	Rhythm,
	SectionKind,
	Verdict
} from '../domain';

/** Ids are whatever the caller uses (database numbers or strings); compared with ===. */
export type Id = number | string;

export interface PlanSection {
	id: Id;
	kind: SectionKind;
	/** Seconds from the evening's start. */
	startS: number;
	endS: number;
	/** For a lesson: the dance taught. */
	danceId?: Id;
	title?: string;
}

export interface PlanEvening {
	/** Milliseconds since the epoch, or an ISO 8601 date-time. */
	startsAt: number | string;
	endsAt: number | string;
	crowd: CrowdMix;
	sections: PlanSection[];
}

export interface PlanDance {
	id: Id;
	name: string;
	level: Level;
	rhythm: Rhythm;
	counts: number;
	walls: number;
	bpmMin: number;
	bpmMax: number;
	/** Most dancers on the floor know it without a walkthrough. */
	wellKnown?: boolean;
	/** Line (the default), partner or circle. */
	formation?: Formation;
}

export interface PlanTrack {
	id: Id;
	title: string;
	artist: string;
	durationS: number;
	bpm: number | null;
}

/** One precomputed track–dance pairing from the fit engine, with the team's verdict if any. */
export interface PlanFit {
	trackId: Id;
	danceId: Id;
	/** Computed fit score, 0..1. */
	score: number;
	verdict: Verdict | null;
	/** Playback rate that suits social dancing: 1, or the rate of a 'fits-at-rate' verdict. */
	rate?: number;
	/** Playback rate the team chose for teaching, if any (below 1 slows the music). */
	lessonRate?: number | null;
}

export interface PlanRequest {
	danceId: Id;
	/** The section it was asked for; without it the first request block, else anywhere. */
	sectionId?: Id;
	weight?: number;
	/** The team accepted it: play it early in its block, before requests still waiting. */
	first?: boolean;
}

export interface MustPlay {
	danceId: Id;
	trackId?: Id;
}

export interface NeverPlay {
	danceIds?: Id[];
	trackIds?: Id[];
}

export interface LockedEntryData {
	kind: EntryKind;
	danceId?: Id | null;
	trackId?: Id | null;
	durationS: number;
	rate?: number;
	sectionId?: Id | null;
	title?: string;
}

export interface LockedEntry {
	/** Index in the existing run order (kept in the output's order among the locks). */
	position: number;
	/** Start in seconds from the evening's start; the planner keeps it exactly. */
	startS: number;
	entry: LockedEntryData;
}

export interface PlanWeights {
	difficulty: number;
	tempo: number;
	energy: number;
	rhythm: number;
	phrasing: number;
	requests: number;
	mustPlay: number;
	lastDance: number;
	reprise: number;
	filler: number;
	breaks: number;
	formation: number;
}

export interface PlanSettings {
	/** A computed score at or above this counts as a fit when the team gave no verdict. */
	fitThreshold: number;
	repeatWindowMin: number;
	/** "A rest after every N minutes of dancing"; 0 (the default) is off. */
	breakEveryMin: number;
	/** A track shorter than this many repetitions of the dance is never planned for it. */
	minRepetitions: number;
	/** Nor is a track (at its planned rate) shorter than this. */
	minTrackS: number;
	breakLengthMin: number;
	/** "One partner dance after every N line dances"; 0 asks for no balance. */
	partnerEvery: number;
	/** Two partner dances may follow each other (never, unless the evening asks). */
	partnerBackToBack: boolean;
	maxConsecutiveFast: number;
	/** Effective tempo (bpm × rate) at or above which an entry counts as fast. */
	fastBpm: number;
	/** Changeover between entries. */
	gapS: number;
	/** Shortest teach; the teach stretches to fill the lesson slot. */
	teachLengthMin: number;
	/** 0 leaves the walkthrough out. */
	walkthroughLengthMin: number;
	/** A section's entries end no earlier than this before the section's end (never after it). */
	endToleranceS: number;
	/** Longest announcement the planner may add to close a gap it cannot fill with music. */
	announcementMaxS: number;
	/** A rate within this of 1 counts as full tempo. */
	fullTempoTolerance: number;
	/** Rate used for the lesson when no track is marked or slow enough. */
	lessonFallbackRate: number;
	weights: PlanWeights;
	/** Wall-clock safety net; the iteration budget is the binding, deterministic limit. */
	timeBudgetMs: number;
	/** Local-search iterations; 0 means greedy only. Defaults from the evening's size. */
	iterations?: number;
	seed: number;
}

export interface PlanInput {
	evening: PlanEvening;
	dances: PlanDance[];
	tracks: PlanTrack[];
	fits: PlanFit[];
	requests?: PlanRequest[];
	mustPlay?: (Id | MustPlay)[];
	neverPlay?: NeverPlay;
	locked?: LockedEntry[];
	settings?: Partial<Omit<PlanSettings, 'weights'>> & { weights?: Partial<PlanWeights> };
	/** Overrides settings.seed. */
	seed?: number;
}

export interface PlanEntry {
	position: number;
	kind: EntryKind;
	danceId: Id | null;
	trackId: Id | null;
	startS: number;
	/** For a dance: the track's duration ÷ rate. */
	durationS: number;
	rate: number;
	locked: boolean;
	sectionId: Id | null;
	title?: string;
	reasons: string[];
}

export interface ObjectiveTerms {
	difficulty: number;
	tempo: number;
	energy: number;
	rhythm: number;
	phrasing: number;
	requests: number;
	mustPlay: number;
	lastDance: number;
	reprise: number;
	filler: number;
	breaks: number;
	formation: number;
	/** Penalty for hard rules broken (0 in a feasible plan). */
	hard: number;
}

export interface PlanResult {
	entries: PlanEntry[];
	/** A weighted penalty: 0 is perfect, lower is better. */
	objective: { total: number; terms: ObjectiveTerms };
	/** Preferences not met, in plain words. */
	unmet: string[];
	/** Hard rules the input made impossible, in plain words (empty when all hold). */
	violations: string[];
	ms: number;
	stats: {
		iterations: number;
		stoppedBy: 'iterations' | 'time' | 'greedy';
		greedyTotal: number;
		seed: number;
	};
}
