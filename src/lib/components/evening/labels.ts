// Words for the evening's kinds, in Floorset's own phrasing (shared by pages and components).
import type { CrowdMix, EntryKind, SectionKind } from '../../domain';

export const CROWD_LABELS: Record<CrowdMix, string> = {
	'mostly-beginners': 'Mostly beginners',
	mixed: 'Mixed',
	experienced: 'Experienced'
};

export const SECTION_LABELS: Record<SectionKind, string> = {
	lesson: 'Lesson',
	'open-floor': 'Open floor',
	'request-block': 'Request block',
	break: 'Break',
	'last-dance': 'Last dance'
};

export const ENTRY_LABELS: Record<EntryKind, string> = {
	dance: 'Dance',
	teach: 'Teach',
	walkthrough: 'Walkthrough',
	break: 'Break',
	announcement: 'Announcement'
};

/** "19:05" for an instant in the club's zone. */
export function clock(ms: number, timeZone: string): string {
	return new Intl.DateTimeFormat('en-GB', {
		timeZone,
		hour: '2-digit',
		minute: '2-digit',
		hourCycle: 'h23'
	}).format(new Date(ms));
}

/** "Friday, 11 December 2026" (as Intl writes it) in the club's zone. */
export function longDate(ms: number, timeZone: string): string {
	return new Intl.DateTimeFormat('en-GB', {
		timeZone,
		weekday: 'long',
		day: 'numeric',
		month: 'long',
		year: 'numeric'
	}).format(new Date(ms));
}
