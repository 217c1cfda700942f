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
