// The run order as CSV (RFC 4180): CRLF line ends, a header row, fields that hold a comma, a
// double quote, CR or LF quoted, quotes inside doubled. Written by hand (not papaparse) so the
// tests can read it back with papaparse as an independent parser.
import { effectiveBpm, levelWord, rateText, wallTime, type RunSheet } from './sheet';

export const CSV_COLUMNS = [
	'position',
	'start time',
	'kind',
	'dance',
	'level',
	'track',
	'artist',
	'BPM',
	'rate',
	'effective BPM',
	'duration (s)',
	'locked',
	'notes',
	'formation'
] as const;

type Cell = string | number | null;

/**
 * A text cell a spreadsheet would run as a formula (=, +, -, @, tab, CR first) gets a leading
 * apostrophe: OWASP's advice on CSV injection (from memory). Numbers are written as numbers.
 */
function guard(value: string): string {
	return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

export function csvField(value: Cell): string {
	if (value === null) return '';
	const text = typeof value === 'number' ? String(value) : guard(value);
	return /[",\r\n]/.test(text) ? `"${text.replaceAll('"', '""')}"` : text;
}

export const csvRow = (cells: readonly Cell[]) => cells.map(csvField).join(',');

export function buildCsv(sheet: RunSheet): string {
	const rows = sheet.entries.map((e) =>
		csvRow([
			e.position,
			wallTime(e.startsAt, sheet.timeZone),
			e.kind,
			e.danceName ?? '',
			levelWord(e.level),
			e.trackTitle ?? '',
			e.artist ?? '',
			e.bpm === null ? null : Math.round(e.bpm * 10) / 10,
			rateText(e.rate),
			effectiveBpm(e),
			Math.round(e.durationS),
			e.locked ? 'yes' : 'no',
			e.text,
			e.formation ?? ''
		])
	);
	// RFC 4180 §2: each record, the last included, ends with CRLF.
	return [csvRow(CSV_COLUMNS), ...rows].map((line) => line + '\r\n').join('');
}
