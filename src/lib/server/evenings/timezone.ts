// The club's time zone. Instants are stored as milliseconds since the epoch; people read and type
// wall-clock times in the club's zone. CLUB_TZ is an IANA zone name (default Europe/London).
// Plain process.env, like config.ts, so the seed and scripts share this module with the app.

const FALLBACK = 'Europe/London';

function isZone(name: string): boolean {
	try {
		new Intl.DateTimeFormat('en-GB', { timeZone: name });
		return true;
	} catch {
		return false;
	}
}

/** The club's IANA time zone from CLUB_TZ, or Europe/London when unset or unknown. */
export function clubTimeZone(): string {
	const name = process.env.CLUB_TZ?.trim();
	return name && isZone(name) ? name : FALLBACK;
}

interface WallParts {
	year: number;
	month: number;
	day: number;
	hour: number;
	minute: number;
	second: number;
}

function partsIn(ms: number, timeZone: string): WallParts {
	const f = new Intl.DateTimeFormat('en-GB', {
		timeZone,
		hourCycle: 'h23',
		year: 'numeric',
		month: '2-digit',
		day: '2-digit',
		hour: '2-digit',
		minute: '2-digit',
		second: '2-digit'
	});
	const get = (type: string) =>
		Number(f.formatToParts(new Date(ms)).find((p) => p.type === type)?.value ?? 0);
	return {
		year: get('year'),
		month: get('month'),
		day: get('day'),
		hour: get('hour'),
		minute: get('minute'),
		second: get('second')
	};
}

/** Offset of the zone from UTC at an instant, in ms (positive east of Greenwich). */
export function zoneOffsetMs(ms: number, timeZone: string): number {
	const p = partsIn(ms, timeZone);
	const asUtc = Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute, p.second);
	return asUtc - Math.floor(ms / 1000) * 1000;
}

const pad = (n: number) => String(n).padStart(2, '0');

/** The wall-clock date (YYYY-MM-DD) and time (HH:MM) of an instant in the zone. */
export function toWall(ms: number, timeZone = clubTimeZone()): { date: string; time: string } {
	const p = partsIn(ms, timeZone);
	return {
		date: `${p.year}-${pad(p.month)}-${pad(p.day)}`,
		time: `${pad(p.hour)}:${pad(p.minute)}`
	};
}

/**
 * The instant of a wall-clock date and time in the zone. A time skipped by a spring-forward
 * change moves forward by the gap, and a repeated autumn time takes its first occurrence (the
 * same choice as Temporal's 'compatible' disambiguation).
 * Returns null for a malformed date or time.
 */
export function fromWall(date: string, time: string, timeZone = clubTimeZone()): number | null {
	const d = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
	const t = /^(\d{2}):(\d{2})$/.exec(time);
	if (!d || !t) return null;
	const [y, mo, da, h, mi] = [d[1], d[2], d[3], t[1], t[2]].map(Number);
	if (mo < 1 || mo > 12 || da < 1 || da > 31 || h > 23 || mi > 59) return null;
	const naive = Date.UTC(y, mo - 1, da, h, mi);
	if (new Date(naive).getUTCDate() !== da) return null;
	// Two passes settle the offset around a change (the first guess uses the naive instant's).
	let guess = naive - zoneOffsetMs(naive, timeZone);
	guess = naive - zoneOffsetMs(guess, timeZone);
	const earlier = naive - zoneOffsetMs(guess - 3_600_000, timeZone);
	if (earlier !== guess && toWall(earlier, timeZone).time === time) return earlier;
	return guess;
}
