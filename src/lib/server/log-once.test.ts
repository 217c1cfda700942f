import { expect, test } from 'vitest';
import { logOncePerMinute } from './log-once';

test('one line per cause per minute, then how many were left out', () => {
	const lines: string[] = [];
	const write = (l: string) => lines.push(l);
	for (let i = 0; i < 50; i++)
		logOncePerMinute('jwt', 'session cookie unreadable', write, 1000 + i);
	logOncePerMinute('other', 'another cause', write, 1100);
	expect(lines).toEqual(['session cookie unreadable', 'another cause']);
	logOncePerMinute('jwt', 'session cookie unreadable', write, 1000 + 59_999);
	expect(lines).toHaveLength(2);
	logOncePerMinute('jwt', 'session cookie unreadable', write, 1000 + 60_000);
	expect(lines[2]).toBe('session cookie unreadable (50 more since the last line)');
});

test('a line is kept short whatever it carries', () => {
	const lines: string[] = [];
	logOncePerMinute('long', 'x'.repeat(5000), (l) => lines.push(l), 0);
	expect(lines[0].length).toBe(300);
});
