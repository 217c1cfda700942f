import { describe, expect, test } from 'vitest';
import { SHEET } from '../testing/sheet';
import { kitFileName, kitPlaylist, kitReadMe, namePart, planKit } from './kit';
import { fileStem } from './sheet';

const files = (id: number) =>
	({
		11: { key: `audio/${'a'.repeat(64)}.mp3`, size: 4000 },
		12: { key: `audio/${'b'.repeat(64)}.ogg`, size: 5000 }
	})[id];

describe('kit file names', () => {
	test('NN - Title - Artist.ext, numbered to the width of the count', () => {
		const e = { trackTitle: 'Tin Roof, Rain', artist: 'Mabel Ashgrove' };
		expect(kitFileName(3, 12, e, 'mp3')).toBe('03 - Tin Roof, Rain - Mabel Ashgrove.mp3');
		expect(kitFileName(7, 120, e, 'ogg')).toBe('007 - Tin Roof, Rain - Mabel Ashgrove.ogg');
	});

	// The characters Windows refuses in names (Microsoft's "Naming Files, Paths, and
	// Namespaces", from memory) plus / for POSIX and control characters: none may survive.
	test('no character a common file system refuses, no trailing dot, no path', () => {
		const name = namePart('../a<b>c:d"e/f\\g|h?i*j\u0007k. .');
		expect(name).toBe('.. a b c d e f g h i j k');
		// eslint-disable-next-line no-control-regex
		expect(name).not.toMatch(/[<>:"/\\|?*\u0000-\u001f]/);
		expect(kitFileName(1, 1, { trackTitle: '/etc/passwd', artist: null }, 'mp3')).toBe(
			'01 - etc passwd.mp3'
		);
	});

	test('long names are cut by characters, not bytes, and empty titles get a word', () => {
		const title = 'é'.repeat(200);
		expect([...namePart(title)]).toHaveLength(60);
		expect(kitFileName(1, 1, { trackTitle: '  ', artist: '' }, 'mp3')).toBe('01 - Untitled.mp3');
	});
});

describe('what goes in the kit', () => {
	const plan = planKit(SHEET, files);

	test('every dance with audio, in run order; a teach plays no file', () => {
		// SHEET's entry 1 is a teach with a track: the DJ plays it by hand, so it is no file.
		expect(plan.audio.map((a) => a.name)).toEqual([
			'01 - Hayloft Lanterns - The Wrenhill Five.mp3',
			'02 - Tin Roof, Rain - Mabel Ashgrove.ogg'
		]);
		expect(plan.audio.map((a) => a.size)).toEqual([4000, 5000]);
		expect(plan.missing).toEqual([]);
	});

	test('the same track twice in a night is two numbered files', () => {
		const again = { ...SHEET.entries[1], position: SHEET.entries.length + 1 };
		const twice = planKit({ ...SHEET, entries: [...SHEET.entries, again] }, files);
		expect(twice.audio.map((a) => a.name)).toEqual([
			'01 - Hayloft Lanterns - The Wrenhill Five.mp3',
			'02 - Tin Roof, Rain - Mabel Ashgrove.ogg',
			'03 - Hayloft Lanterns - The Wrenhill Five.mp3'
		]);
	});

	test('a track whose file is gone is left out, renumbered around, and named as missing', () => {
		const gone = planKit(SHEET, (id) =>
			id === 11 ? { key: files(11)!.key, size: null } : files(id)
		);
		expect(gone.audio.map((a) => a.name)).toEqual(['01 - Tin Roof, Rain - Mabel Ashgrove.ogg']);
		expect(gone.missing.map((e) => e.position)).toEqual([2]);
		expect(kitReadMe(SHEET, gone)).toContain('2. Hayloft Lanterns');
	});

	// RFC 8216 §4.1: a URI line may be relative to the playlist; each follows its #EXTINF.
	test('the playlist names the files beside it, never a URL', () => {
		const lines = kitPlaylist(SHEET, plan).split('\n').filter(Boolean);
		expect(lines[0]).toBe('#EXTM3U');
		const uris = lines.filter((l) => !l.startsWith('#'));
		expect(uris).toEqual(plan.audio.map((a) => a.name));
		expect(lines.filter((l) => l.startsWith('#EXTINF:'))).toHaveLength(2);
	});

	test('the read-me says how to play, which rates to set by hand and the sound caution', () => {
		const readMe = kitReadMe(SHEET, plan);
		expect(readMe).toContain('run-order.m3u8');
		// SHEET's entry 2 plays at 0.9: a player plays the file as recorded.
		expect(readMe).toContain('01 - Hayloft Lanterns - The Wrenhill Five.mp3: play at');
		expect(readMe).toContain('100 dB');
		expect(readMe.split('\r\n').length).toBeGreaterThan(5);
	});
});

describe('download names', () => {
	// Issue 15's example: the evening's name and its date in the club's zone.
	test('title and date in the club’s zone, plain ASCII', () => {
		const at = Date.parse('2026-12-11T19:30:00Z');
		const base = { id: 3, startsAt: at, timeZone: 'Europe/London' };
		expect(fileStem({ ...base, title: 'Lantern Night' })).toBe('lantern-night-2026-12-11');
		expect(fileStem({ ...base, title: 'Café “Señor” Nights!' })).toBe(
			'cafe-senor-nights-2026-12-11'
		);
		// 23:30 UTC on the 11th is already the 12th in Auckland (UTC+13 in December).
		expect(
			fileStem({
				...base,
				title: 'Late',
				startsAt: Date.parse('2026-12-11T23:30:00Z'),
				timeZone: 'Pacific/Auckland'
			})
		).toBe('late-2026-12-12');
		expect(fileStem({ ...base, title: 'ダンス' })).toBe('evening-3-2026-12-11');
		expect(fileStem({ ...base, title: 'x"; rm -rf /' })).toMatch(/^[a-z0-9-]+$/);
	});
});
