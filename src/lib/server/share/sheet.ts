// The run sheet: one evening's facts in the shape every export reads (CSV, M3U8, PDF, iCalendar,
// e-mail, the print page). Plain data, so the builders are pure and tested without a database.
import {
	LEVEL_LABELS,
	type CrowdMix,
	type EntryKind,
	type Formation,
	type Level,
	type SectionKind
} from '../../domain';

export interface SheetSection {
	kind: SectionKind;
	title: string;
	startsAt: number;
	endsAt: number;
	danceName: string | null;
	/** First name only: the public page and exports show no more of a person. */
	teacherFirstName: string | null;
}

export interface SheetEntry {
	/** 1-based, as people count. */
	position: number;
	kind: EntryKind;
	/** Milliseconds since the epoch. */
	startsAt: number;
	durationS: number;
	danceId: number | null;
	danceName: string | null;
	level: Level | null;
	formation: Formation | null;
	trackId: number | null;
	trackTitle: string | null;
	artist: string | null;
	/** The track's own length, as a playlist player plays it (the rate ignored). */
	trackDurationS: number | null;
	/** The track's audio file is gone (start-up sweep): no playlist line for it. */
	audioMissing?: boolean;
	bpm: number | null;
	rate: number;
	locked: boolean;
	text: string;
}

export interface RunSheet {
	id: number;
	title: string;
	venue: string;
	startsAt: number;
	endsAt: number;
	crowd: CrowdMix;
	notes: string;
	published: boolean;
	/** Absolute URL of the public page, when published. */
	shareUrl: string | null;
	/** IANA zone the times are shown in. */
	timeZone: string;
	sections: SheetSection[];
	entries: SheetEntry[];
}

export const KIND_LABELS: Record<EntryKind, string> = {
	dance: 'Dance',
	teach: 'Teach',
	walkthrough: 'Walkthrough',
	break: 'Break',
	announcement: 'Announcement'
};

export const SECTION_LABELS: Record<SectionKind, string> = {
	lesson: 'Lesson',
	'open-floor': 'Open floor',
	'request-block': 'Request block',
	break: 'Break',
	'last-dance': 'Last dance'
};

export const CROWD_LABELS: Record<CrowdMix, string> = {
	'mostly-beginners': 'Mostly beginners',
	mixed: 'Mixed',
	experienced: 'Experienced'
};

export const levelWord = (level: Level | null) => (level ? LEVEL_LABELS[level] : '');

/** Effective tempo at a playback rate is bpm × rate (DESIGN.md, Tempo), to one decimal. */
export const effectiveBpm = (e: Pick<SheetEntry, 'bpm' | 'rate'>) =>
	e.bpm === null ? null : Math.round(e.bpm * e.rate * 10) / 10;

/** A short line naming what an entry is: the dance and its level, or its own text. */
export function entryTitle(e: SheetEntry): string {
	const text = e.text.trim();
	if (e.kind === 'dance' || e.kind === 'teach' || e.kind === 'walkthrough') {
		if (e.danceName) return e.level ? `${e.danceName} (${levelWord(e.level)})` : e.danceName;
	}
	return text || KIND_LABELS[e.kind];
}

export const trackLine = (e: SheetEntry) =>
	e.trackTitle ? (e.artist ? `${e.trackTitle} · ${e.artist}` : e.trackTitle) : '';

// Building an Intl formatter costs far more than using one: keep one per zone (a pure memo).
const clocks = new Map<string, Intl.DateTimeFormat>();
function clock(timeZone: string) {
	let f = clocks.get(timeZone);
	if (!f) {
		f = new Intl.DateTimeFormat('en-GB', {
			timeZone,
			hour: '2-digit',
			minute: '2-digit',
			hourCycle: 'h23'
		});
		clocks.set(timeZone, f);
	}
	return f;
}

/** Wall-clock HH:MM in the sheet's zone. */
export const wallTime = (ms: number, timeZone: string) => clock(timeZone).format(new Date(ms));

/** A date people read: "Friday 11 December 2026" (built from parts: ICU versions differ on commas). */
export function wallDate(ms: number, timeZone: string): string {
	const parts = new Intl.DateTimeFormat('en-GB', {
		timeZone,
		weekday: 'long',
		day: 'numeric',
		month: 'long',
		year: 'numeric'
	}).formatToParts(new Date(ms));
	const get = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value;
	return `${get('weekday')} ${get('day')} ${get('month')} ${get('year')}`;
}

/** "0.90" for a rate, always two decimals so columns line up. */
export const rateText = (rate: number) => rate.toFixed(2);

/**
 * The name the evening's downloads carry: its title in plain lower-case ASCII and its date in
 * the club's zone, e.g. "lantern-night-2026-12-11". Only [a-z0-9-], so no header can be forged
 * through it; a title with no Latin letters falls back to "evening-<id>".
 */
export function fileStem(sheet: Pick<RunSheet, 'id' | 'title' | 'startsAt' | 'timeZone'>): string {
	const slug = sheet.title
		.normalize('NFKD')
		.replace(/[\u0300-\u036f]/g, '')
		.toLowerCase()
		.replace(/[^a-z0-9]+/g, '-')
		.replace(/^-+|-+$/g, '')
		.slice(0, 60)
		.replace(/-+$/, '');
	// en-CA writes dates as ISO 8601 does: YYYY-MM-DD.
	const day = new Intl.DateTimeFormat('en-CA', {
		timeZone: sheet.timeZone,
		year: 'numeric',
		month: '2-digit',
		day: '2-digit'
	}).format(new Date(sheet.startsAt));
	return `${slug || `evening-${sheet.id}`}-${day}`;
}
