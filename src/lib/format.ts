// How Floorset writes lengths of time, in one place for the server, the pages and the exports.

/** A length in seconds as minutes:seconds, rounded to the second: 215.4 → "3:35", 59.6 → "1:00". */
export function minutesSeconds(seconds: number): string {
	const s = Math.max(0, Math.round(seconds));
	return `${Math.floor(s / 60)}:${String(s % 60).padStart(2, '0')}`;
}
