// How Floorset writes lengths of time, clock times and dates, in one place for the server, the
// pages and the exports. Instants are written in the club's time zone (the caller passes it), in
// British English: 24-hour clock, day before month.

/** A length in seconds as minutes:seconds, rounded to the second: 215.4 → "3:35", 59.6 → "1:00". */
export function minutesSeconds(seconds: number): string {
	const s = Math.max(0, Math.round(seconds));
	return `${Math.floor(s / 60)}:${String(s % 60).padStart(2, '0')}`;
}

/** An instant written in British English in the club's zone, with the parts `parts` asks for. */
const inZone = (ms: number, timeZone: string, parts: Intl.DateTimeFormatOptions) =>
	new Intl.DateTimeFormat('en-GB', { timeZone, ...parts }).format(new Date(ms));

/** "19:05" (or "19:05:09" with seconds, for a running clock) for an instant in the club's zone. */
export const clock = (ms: number, timeZone: string, seconds = false) =>
	inZone(ms, timeZone, {
		hour: '2-digit',
		minute: '2-digit',
		second: seconds ? '2-digit' : undefined,
		hourCycle: 'h23'
	});

/** "Friday, 11 December 2026" (as Intl writes it) in the club's zone. */
export const longDate = (ms: number, timeZone: string) =>
	inZone(ms, timeZone, { weekday: 'long', day: 'numeric', month: 'long', year: 'numeric' });

/** "4 Dec 2026", in the club's zone. */
export const shortDate = (ms: number, timeZone: string) =>
	inZone(ms, timeZone, { day: 'numeric', month: 'short', year: 'numeric' });

/** "4 Dec 2026, 19:05": when something happened, in the club's zone. */
export const dateTime = (ms: number, timeZone: string) =>
	`${shortDate(ms, timeZone)}, ${clock(ms, timeZone)}`;
