// The evening as an iCalendar entry (RFC 5545), written by hand: ical-generator 11 needs Node 22.
// One VCALENDAR (PRODID, VERSION:2.0) with one VEVENT (UID, DTSTAMP, DTSTART/DTEND in UTC,
// SUMMARY, LOCATION, DESCRIPTION, URL when published); CRLF line ends, lines folded at 75 octets.
import { SECTION_LABELS, wallTime, type RunSheet } from './sheet';

/** RFC 5545 §3.3.5 form 2, UTC: 20261211T190000Z. */
export function utcStamp(ms: number): string {
	return new Date(ms)
		.toISOString()
		.replace(/[-:]/g, '')
		.replace(/\.\d{3}/, '');
}

/** RFC 5545 §3.3.11: backslash, semicolon and comma escaped, a line break written as \n. */
export function escapeText(value: string): string {
	return value
		.replace(/\\/g, '\\\\')
		.replace(/;/g, '\\;')
		.replace(/,/g, '\\,')
		.replace(/\r\n|\r|\n/g, '\\n');
}

const encoder = new TextEncoder();

/**
 * RFC 5545 §3.1: a line longer than 75 octets is split with CRLF and one space; the space
 * counts towards the next line's 75. A UTF-8 sequence is never cut in two.
 */
export function foldLine(line: string): string {
	const parts: string[] = [];
	let current = '';
	let octets = 0;
	let limit = 75;
	for (const char of line) {
		const size = encoder.encode(char).length;
		if (octets + size > limit) {
			parts.push(current);
			current = '';
			octets = 0;
			limit = 74;
		}
		current += char;
		octets += size;
	}
	parts.push(current);
	return parts.join('\r\n ');
}

function description(sheet: RunSheet): string {
	const at = (ms: number) => wallTime(ms, sheet.timeZone);
	const lines = sheet.sections.map((s) => {
		const what = s.title || SECTION_LABELS[s.kind];
		const dance = s.kind === 'lesson' && s.danceName ? ` (${s.danceName})` : '';
		return `${at(s.startsAt)}–${at(s.endsAt)} ${what}${dance}`;
	});
	const dances = sheet.entries.filter((e) => e.kind === 'dance').length;
	if (dances) lines.push(`${dances} dances in the run order.`);
	if (sheet.shareUrl) lines.push(`Run order and requests: ${sheet.shareUrl}`);
	return lines.join('\n');
}

export interface IcsOptions {
	/** Host part of the UID, so it is unique beyond this server (RFC 5545 §3.8.4.7). */
	host: string;
	/** DTSTAMP: when this file was made. */
	now?: number;
}

export function buildIcs(sheet: RunSheet, options: IcsOptions): string {
	const lines = [
		'BEGIN:VCALENDAR',
		'VERSION:2.0',
		'PRODID:-//Floorset//Run orders//EN',
		'CALSCALE:GREGORIAN',
		'METHOD:PUBLISH',
		'BEGIN:VEVENT',
		`UID:floorset-evening-${sheet.id}@${options.host}`,
		`DTSTAMP:${utcStamp(options.now ?? Date.now())}`,
		`DTSTART:${utcStamp(sheet.startsAt)}`,
		`DTEND:${utcStamp(sheet.endsAt)}`,
		`SUMMARY:${escapeText(sheet.title)}`
	];
	if (sheet.venue) lines.push(`LOCATION:${escapeText(sheet.venue)}`);
	lines.push(`DESCRIPTION:${escapeText(description(sheet))}`);
	// URL is of type URI (§3.8.4.6): not escaped as TEXT.
	if (sheet.shareUrl) lines.push(`URL:${sheet.shareUrl}`);
	lines.push('END:VEVENT', 'END:VCALENDAR');
	return lines.map(foldLine).join('\r\n') + '\r\n';
}
