// The names DESIGN.md gives the domain, shared by the server, the browser and the pure modules.
// Plain data only: no framework imports, so every module in src/lib/ can use it.

export const ROLES = ['admin', 'organiser', 'dj', 'instructor', 'dancer'] as const;
export type Role = (typeof ROLES)[number];

/** The roles as the screens name them. */
export const ROLE_LABELS: Record<Role, string> = {
	admin: 'Admin',
	organiser: 'Organiser',
	dj: 'DJ',
	instructor: 'Instructor',
	dancer: 'Dancer'
};

/** "DJ, Instructor": a person's roles in the screens' words. */
export const roleWords = (roles: readonly string[]) =>
	roles.map((r) => ROLE_LABELS[r as Role] ?? r).join(', ');

export const LEVELS = [
	'absolute-beginner',
	'beginner',
	'improver',
	'intermediate',
	'advanced'
] as const;
export type Level = (typeof LEVELS)[number];

/** Words shown beside each level, so colour is never the only carrier of meaning. */
export const LEVEL_LABELS: Record<Level, string> = {
	'absolute-beginner': 'Absolute beginner',
	beginner: 'Beginner',
	improver: 'Improver',
	intermediate: 'Intermediate',
	advanced: 'Advanced'
};

/** 0 = easiest … 4 = hardest; the planner and the chart use this scale. */
export const levelRank = (level: Level): number => LEVELS.indexOf(level);

/** Beats per bar: 4 for 4/4, 3 for 3/4. */
export type Meter = 3 | 4;

export const RHYTHMS = [
	'two-step',
	'triple-two-step',
	'cha-cha',
	'waltz',
	'east-coast-swing',
	'west-coast-swing',
	'nightclub',
	'polka',
	'rumba',
	'shuffle',
	'rock',
	'other'
] as const;
export type Rhythm = (typeof RHYTHMS)[number];

/** The rhythms as people write them: what every screen and export shows, never the slug. */
export const RHYTHM_LABELS: Record<Rhythm, string> = {
	'two-step': 'Two-step',
	'triple-two-step': 'Triple two-step',
	'cha-cha': 'Cha-cha',
	waltz: 'Waltz',
	'east-coast-swing': 'East coast swing',
	'west-coast-swing': 'West coast swing',
	nightclub: 'Nightclub',
	polka: 'Polka',
	rumba: 'Rumba',
	shuffle: 'Shuffle',
	rock: 'Rock',
	other: 'Other'
};

/**
 * How dancers stand (trade terms): each alone in lines, with a partner, or in a circle (mixers
 * included). A country night alternates line dances with partner dances (common practice).
 */
export const FORMATIONS = ['line', 'partner', 'circle'] as const;
export type Formation = (typeof FORMATIONS)[number];

export const FORMATION_LABELS: Record<Formation, string> = {
	line: 'Line dance',
	partner: 'Partner dance',
	circle: 'Circle dance'
};

export const TEMPO_SOURCES = ['detected', 'tapped', 'entered', 'tag'] as const;
export type TempoSource = (typeof TEMPO_SOURCES)[number];

export const VERDICTS = ['fits', 'fits-at-rate', 'does-not-fit'] as const;
export type Verdict = (typeof VERDICTS)[number];

export const CROWD_MIXES = ['mostly-beginners', 'mixed', 'experienced'] as const;
export type CrowdMix = (typeof CROWD_MIXES)[number];

export const SECTION_KINDS = [
	'lesson',
	'open-floor',
	'request-block',
	'break',
	'last-dance'
] as const;
export type SectionKind = (typeof SECTION_KINDS)[number];

export const ENTRY_KINDS = ['dance', 'teach', 'walkthrough', 'break', 'announcement'] as const;
export type EntryKind = (typeof ENTRY_KINDS)[number];

/** A tag inserts counts, a restart begins the sequence again part-way (trade vocabulary). */
export interface PhraseEvent {
	kind: 'tag' | 'restart';
	/** 1-based repetition of the dance during which it happens. */
	repetition: number;
	/** The count after which it happens (for a restart: where the sequence is cut). */
	afterCount: number;
	/** Counts inserted by a tag; ignored for a restart. */
	lengthCounts: number;
}

/** What the pure modules need to know of a track. */
export interface TrackFacts {
	id: number;
	title: string;
	artist: string;
	durationS: number;
	bpm: number | null;
	offsetS: number;
	meter: Meter;
	phraseBeats: number;
	introBeats: number;
}

/** What the pure modules need to know of a dance. */
export interface DanceFacts {
	id: number;
	name: string;
	counts: number;
	walls: 1 | 2 | 4;
	level: Level;
	rhythm: Rhythm;
	meter: Meter;
	bpmMin: number;
	bpmMax: number;
	turn: 'left' | 'right' | null;
	events: PhraseEvent[];
}
