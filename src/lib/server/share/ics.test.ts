import ICAL from 'ical.js';
import { describe, expect, test } from 'vitest';
import { buildIcs, escapeText, foldLine, utcStamp } from './ics';
import { SHEET } from '../testing/sheet';

const NOW = Date.UTC(2026, 10, 30, 12, 34, 56);
const text = buildIcs(SHEET, { host: 'floorset.example', now: NOW });
const octets = (s: string) => new TextEncoder().encode(s).length;

// Read back with ical.js (Mozilla's general-purpose iCalendar parser), independent of our writer.
describe('iCalendar export (RFC 5545)', () => {
	const calendar = new ICAL.Component(ICAL.parse(text));
	const event = calendar.getFirstSubcomponent('vevent')!;

	test('VCALENDAR carries VERSION:2.0 and PRODID (§3.7.3, §3.7.4)', () => {
		expect(calendar.name).toBe('vcalendar');
		expect(calendar.getFirstPropertyValue('version')).toBe('2.0');
		expect(String(calendar.getFirstPropertyValue('prodid'))).toMatch(/Floorset/);
	});

	test('VEVENT has UID, DTSTAMP and DTSTART/DTEND in UTC (§3.6.1, §3.3.5 form 2)', () => {
		expect(event.getFirstPropertyValue('uid')).toBe('floorset-evening-7@floorset.example');
		const stamp = event.getFirstPropertyValue('dtstamp') as ICAL.Time;
		expect(stamp.toJSDate().getTime()).toBe(NOW);
		const start = event.getFirstPropertyValue('dtstart') as ICAL.Time;
		const end = event.getFirstPropertyValue('dtend') as ICAL.Time;
		expect(start.zone?.tzid).toBe('UTC');
		expect(start.toJSDate().getTime()).toBe(SHEET.startsAt);
		expect(end.toJSDate().getTime()).toBe(SHEET.endsAt);
		expect(text).toContain('\r\nDTSTART:20261211T190000Z\r\n');
		expect(text).toContain('\r\nDTEND:20261211T230000Z\r\n');
	});

	test('SUMMARY, LOCATION, DESCRIPTION and URL read back as written (§3.3.11 escapes)', () => {
		expect(event.getFirstPropertyValue('summary')).toBe(SHEET.title);
		expect(event.getFirstPropertyValue('location')).toBe(SHEET.venue);
		const description = String(event.getFirstPropertyValue('description'));
		expect(description).toContain('19:00–19:30 Lesson (Pebble Lane Stroll)');
		expect(description).toContain(`Run order and requests: ${SHEET.shareUrl}`);
		expect(description.split('\n').length).toBeGreaterThan(2);
		expect(event.getFirstPropertyValue('url')).toBe(SHEET.shareUrl);
	});

	test('no URL when the evening is not published', () => {
		const draft = buildIcs({ ...SHEET, published: false, shareUrl: null }, { host: 'h.example' });
		expect(draft).not.toMatch(/\r\nURL:/);
	});

	test('CRLF line ends and every line at most 75 octets (§3.1)', () => {
		expect(text.endsWith('\r\n')).toBe(true);
		expect(text.replace(/\r\n/g, '')).not.toMatch(/[\r\n]/);
		const lines = text.split('\r\n').slice(0, -1);
		for (const line of lines) expect(octets(line), line).toBeLessThanOrEqual(75);
		// The long title really was folded, and unfolding restores it.
		expect(lines.some((l) => l.startsWith(' '))).toBe(true);
	});

	test('folding never splits a UTF-8 character and unfolds to the original (§3.1)', () => {
		const line = 'SUMMARY:' + 'é–“'.repeat(40);
		const folded = foldLine(line);
		for (const part of folded.split('\r\n')) expect(octets(part)).toBeLessThanOrEqual(75);
		expect(folded.replace(/\r\n /g, '')).toBe(line);
		expect(folded).not.toContain('\uFFFD');
	});

	test('text escapes and UTC stamps (§3.3.11, §3.3.5)', () => {
		expect(escapeText('a,b;c\\d\ne')).toBe('a\\,b\\;c\\\\d\\ne');
		expect(utcStamp(Date.UTC(2027, 0, 8, 19, 30, 5))).toBe('20270108T193005Z');
	});
});
