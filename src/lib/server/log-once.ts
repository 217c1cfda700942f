// Some failures are caused from outside at any rate a client likes (a damaged session cookie
// on every request). Each cause is logged as one short line at most once a minute, with how many
// were left out since, so the log says what happens without filling the disk.

const EVERY_MS = 60_000;
const MAX_CAUSES = 1000;

const last = new Map<string, { at: number; skipped: number }>();

/** Writes `line` unless the same cause was written less than a minute ago; true when written. */
export function logOncePerMinute(
	cause: string,
	line: string,
	write: (line: string) => void = console.warn,
	now = Date.now()
): boolean {
	const seen = last.get(cause);
	if (seen && now - seen.at < EVERY_MS) {
		seen.skipped++;
		return false;
	}
	if (!seen && last.size >= MAX_CAUSES) last.delete(last.keys().next().value!);
	const skipped = seen?.skipped ? ` (${seen.skipped} more since the last line)` : '';
	last.set(cause, { at: now, skipped: 0 });
	write(line.slice(0, 300) + skipped);
	return true;
}
