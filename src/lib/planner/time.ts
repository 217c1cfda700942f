// Time arithmetic for the run order: lengths, start times and words for durations.

/** Milliseconds since the epoch from a number or an ISO 8601 string. */
export function toEpochMs(value: number | string): number {
	const ms = typeof value === 'number' ? value : Date.parse(value);
	if (!Number.isFinite(ms)) throw new Error(`not a date-time: ${String(value)}`);
	return ms;
}

/** Length of the evening in seconds. */
export function eveningLengthS(startsAt: number | string, endsAt: number | string): number {
	return Math.max(0, (toEpochMs(endsAt) - toEpochMs(startsAt)) / 1000);
}

/** How long a track lasts when played at a rate: slowing to 0.85× stretches it by 1 ÷ 0.85. */
export const playedLengthS = (trackS: number, rate: number): number => trackS / rate;

/** Start times of back-to-back entries with a fixed changeover between them. */
export function startTimes(startS: number, durations: number[], gapS: number): number[] {
	const starts: number[] = [];
	let t = startS;
	for (const d of durations) {
		starts.push(t);
		t += d + gapS;
	}
	return starts;
}

/** Where a run of entries ends: the last one's start plus its length (no changeover after it). */
export function endOf(startS: number, durations: number[], gapS: number): number {
	if (durations.length === 0) return startS;
	let sum = 0;
	for (const d of durations) sum += d;
	return startS + sum + gapS * (durations.length - 1);
}

/** "44 minutes", "1 h 20 min": for reasons shown to people. */
export function minutesWords(seconds: number): string {
	const minutes = Math.round(seconds / 60);
	if (minutes < 60) return `${minutes} minute${minutes === 1 ? '' : 's'}`;
	const h = Math.floor(minutes / 60);
	const m = minutes % 60;
	return m === 0 ? `${h} h` : `${h} h ${m} min`;
}
