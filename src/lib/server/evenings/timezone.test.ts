import { afterEach, describe, expect, test } from 'vitest';
import { clubTimeZone, fromWall, toWall, zoneOffsetMs } from './timezone';

// Offsets and change-over dates of Europe/London: the IANA tz database (GMT in winter, BST = UTC+1
// from the last Sunday of March 01:00 UTC to the last Sunday of October 01:00 UTC).
describe('club time zone', () => {
	afterEach(() => {
		delete process.env.CLUB_TZ;
	});

	test('defaults to Europe/London and ignores an unknown zone', () => {
		expect(clubTimeZone()).toBe('Europe/London');
		process.env.CLUB_TZ = 'Not/AZone';
		expect(clubTimeZone()).toBe('Europe/London');
		process.env.CLUB_TZ = 'America/Denver';
		expect(clubTimeZone()).toBe('America/Denver');
	});

	test('winter is GMT, summer is BST', () => {
		expect(zoneOffsetMs(Date.UTC(2026, 11, 11, 19), 'Europe/London')).toBe(0);
		expect(zoneOffsetMs(Date.UTC(2026, 6, 11, 19), 'Europe/London')).toBe(3_600_000);
	});

	test('wall time round-trips in both seasons', () => {
		const winter = fromWall('2026-12-11', '19:00', 'Europe/London');
		expect(winter).toBe(Date.UTC(2026, 11, 11, 19, 0));
		const summer = fromWall('2026-07-11', '19:00', 'Europe/London');
		expect(summer).toBe(Date.UTC(2026, 6, 11, 18, 0));
		expect(toWall(summer!, 'Europe/London')).toEqual({ date: '2026-07-11', time: '19:00' });
		// America/Denver in December is UTC−7 (IANA tz database, Mountain Standard Time).
		expect(fromWall('2026-12-11', '19:00', 'America/Denver')).toBe(Date.UTC(2026, 11, 12, 2, 0));
	});

	test('a skipped spring time moves later; a repeated autumn time takes its first occurrence', () => {
		// 2026-03-29 01:30 does not exist in London (clocks go 01:00 → 02:00 GMT→BST).
		expect(fromWall('2026-03-29', '01:30', 'Europe/London')).toBe(Date.UTC(2026, 2, 29, 1, 30));
		// 2026-10-25 01:30 happens twice; the first is BST (00:30 UTC).
		expect(fromWall('2026-10-25', '01:30', 'Europe/London')).toBe(Date.UTC(2026, 9, 25, 0, 30));
	});

	test('rejects malformed input', () => {
		expect(fromWall('2026-02-30', '19:00')).toBeNull();
		expect(fromWall('2026-12-11', '25:00')).toBeNull();
		expect(fromWall('11/12/2026', '19:00')).toBeNull();
	});
});
