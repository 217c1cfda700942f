import { expect, test } from 'vitest';
import { blockText, lineText } from './text';

// The characters are named by their Unicode code points (Unicode Standard, UAX #9 for bidi).
const LINE_BREAK_FORGERY = 'Reel\r\nBcc: someone@example.test';

test('a single-line field refuses line breaks, NUL, other controls and bidi overrides', () => {
	const title = lineText(100, 'title');
	for (const bad of [
		LINE_BREAK_FORGERY,
		'a\u0000b',
		'a\tb',
		'a\u0085b',
		'exe.\u202emp3',
		'a\u2066b'
	]) {
		const r = title.safeParse(bad);
		expect(r.success, JSON.stringify(bad)).toBe(false);
		expect(r.error?.issues[0].message).toBe(
			'Keep the title on one line, without control characters.'
		);
	}
	expect(title.parse('  Brambleford Two-Step — café  ')).toBe('Brambleford Two-Step — café');
	expect(title.safeParse('x'.repeat(101)).success).toBe(false);
});

test('a multi-line field keeps line breaks and tabs, refuses other controls', () => {
	const notes = blockText(2000, 'notes');
	expect(notes.parse('Line one\r\nLine two\tindented')).toBe('Line one\r\nLine two\tindented');
	expect(notes.safeParse('bell\u0007').success).toBe(false);
	expect(notes.safeParse('flip\u202e').success).toBe(false);
	expect(notes.safeParse('x'.repeat(2001)).error?.issues[0].message).toBe(
		'Keep the notes under 2,000 characters.'
	);
});
