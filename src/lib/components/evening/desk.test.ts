import { describe, expect, test } from 'vitest';
import { deskPosition } from './desk';

// Worked examples by plain arithmetic: entries at 0, 200 and 400 s, each 180 s long.
const entries = [
	{ kind: 'dance', startS: 0, durationS: 180, sectionId: 1 },
	{ kind: 'announcement', startS: 200, durationS: 60, sectionId: 1 },
	{ kind: 'dance', startS: 400, durationS: 180, sectionId: 2 }
];
const sections = [
	{ id: 1, startS: 0, endS: 300 },
	{ id: 2, startS: 300, endS: 900 }
];

describe('the desk follows the clock', () => {
	test('before the evening the first entry is next', () => {
		expect(deskPosition(entries, sections, -60)).toMatchObject({
			phase: 'before',
			current: null,
			next: 0,
			nextAnnouncement: 1
		});
	});

	test('during an entry: time left in it and in its section', () => {
		// At 100 s: the first dance has 180 − 100 = 80 s left; its section 300 − 100 = 200 s.
		expect(deskPosition(entries, sections, 100)).toMatchObject({
			phase: 'during',
			current: 0,
			next: 1,
			entryLeftS: 80,
			sectionLeftS: 200,
			nextAnnouncement: 1
		});
		// At 450 s: the last dance, 400 + 180 − 450 = 130 s left; section 900 − 450 = 450 s.
		expect(deskPosition(entries, sections, 450)).toMatchObject({
			current: 2,
			next: null,
			entryLeftS: 130,
			sectionLeftS: 450,
			nextAnnouncement: null
		});
	});

	test('after the last entry, and a manual position', () => {
		expect(deskPosition(entries, sections, 1000).phase).toBe('after');
		expect(deskPosition(entries, sections, -60, 1)).toMatchObject({ current: 1, next: 2 });
		expect(deskPosition(entries, sections, 0, 9).current).toBe(2);
		expect(deskPosition([], [], 0)).toMatchObject({ phase: 'before', current: null, next: null });
	});
});

describe('the next rest', () => {
	// Entries at 0, 200 (a break of 300 s) and 500 s: the rest is 200 s away at the start, under
	// way at 250 s (no wait), and after it none is left. Plain arithmetic.
	const withRest = [
		{ kind: 'dance', startS: 0, durationS: 180, sectionId: 1 },
		{ kind: 'break', startS: 200, durationS: 300, sectionId: 1 },
		{ kind: 'dance', startS: 500, durationS: 180, sectionId: 2 }
	];
	test('counts down to the next break, holds at 0 during it, and is null after', () => {
		expect(deskPosition(withRest, sections, 60)).toMatchObject({ nextRest: 1, restInS: 140 });
		expect(deskPosition(withRest, sections, -100)).toMatchObject({ nextRest: 1, restInS: 300 });
		expect(deskPosition(withRest, sections, 250)).toMatchObject({ nextRest: 1, restInS: 0 });
		expect(deskPosition(withRest, sections, 520)).toMatchObject({ nextRest: null, restInS: null });
	});
});
