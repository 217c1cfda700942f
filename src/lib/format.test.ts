import { expect, test } from 'vitest';
import { clock, dateTime, longDate, minutesSeconds, shortDate } from './format';

test('minutes:seconds rounds to the whole second before splitting', () => {
	expect(minutesSeconds(215.4)).toBe('3:35');
	// 59.6 s is "1:00", never "0:60".
	expect(minutesSeconds(59.6)).toBe('1:00');
	expect(minutesSeconds(0)).toBe('0:00');
	expect(minutesSeconds(-3)).toBe('0:00');
	expect(minutesSeconds(3600)).toBe('60:00');
});

// Expected strings written by hand from the instants (London is UTC+0 in December, UTC+1 in
// July, by the IANA tz database); the same formats Intl.DateTimeFormat writes for en-GB.
test('clock times and dates in the club’s zone, 24-hour, day before month', () => {
	const winter = Date.parse('2026-12-04T19:05:00Z');
	expect(clock(winter, 'Europe/London')).toBe('19:05');
	expect(clock(winter + 9000, 'Europe/London', true)).toBe('19:05:09');
	expect(shortDate(winter, 'Europe/London')).toBe('4 Dec 2026');
	expect(dateTime(winter, 'Europe/London')).toBe('4 Dec 2026, 19:05');
	expect(longDate(winter, 'Europe/London')).toBe('Friday, 4 December 2026');
	// Summer time moves the clock, and a late hour can fall on the next day elsewhere.
	const summer = Date.parse('2026-07-10T23:30:00Z');
	expect(clock(summer, 'Europe/London')).toBe('00:30');
	expect(shortDate(summer, 'Europe/London')).toBe('11 Jul 2026');
	expect(clock(summer, 'America/Chicago')).toBe('18:30');
});
