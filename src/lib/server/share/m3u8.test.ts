import { describe, expect, test } from 'vitest';
import { audioUrl, buildM3u8, type UriOf } from './m3u8';
import { SHEET } from '../testing/sheet';

// Line checks against RFC 8216: §4.3.1.1 the first line is #EXTM3U; §4.3.2.1 #EXTINF:<duration>,
// <title> applies to the URI on the next line (after any comment); §4.1 a line that starts
// with # but not #EXT is a comment.
const online: UriOf = (e) => audioUrl('https://floorset.example/', e.trackId);

describe('M3U8 export', () => {
	const text = buildM3u8(SHEET, online);
	const lines = text.split('\n').filter((l) => l !== '');

	test('starts with #EXTM3U and holds only tags, comments and absolute URIs', () => {
		expect(lines[0]).toBe('#EXTM3U');
		for (const line of lines.slice(1)) {
			expect(line.startsWith('#EXT') || line.startsWith('#') || /^https:\/\//.test(line)).toBe(
				true
			);
		}
	});

	test('one #EXTINF per dance entry with a track, durations in whole seconds against the run order', () => {
		const dances = SHEET.entries.filter((e) => e.kind === 'dance' && e.trackId !== null);
		const infs = lines.filter((l) => l.startsWith('#EXTINF:'));
		expect(infs).toHaveLength(dances.length);
		dances.forEach((e, i) => {
			const m = /^#EXTINF:(\d+),(.*)$/.exec(infs[i]);
			expect(m, infs[i]).not.toBeNull();
			// The track's own length, rounded: 201.6 → 202, 187.4 → 187 (plain arithmetic).
			expect(Number(m![1])).toBe(Math.round(e.trackDurationS!));
			expect(m![2]).toBe(`${e.artist} - ${e.trackTitle}`);
		});
		expect(infs[0]).toBe('#EXTINF:202,The Wrenhill Five - Hayloft Lanterns');
		expect(infs[1]).toBe('#EXTINF:187,Mabel Ashgrove - Tin Roof, Rain');
	});

	test('each #EXTINF is followed (after comments) by the track audio URL', () => {
		const uris: string[] = [];
		lines.forEach((l, i) => {
			if (!l.startsWith('#EXTINF:')) return;
			let j = i + 1;
			while (lines[j].startsWith('#') && !lines[j].startsWith('#EXT')) j++;
			uris.push(lines[j]);
		});
		expect(uris).toEqual([
			'https://floorset.example/api/tracks/11/audio',
			'https://floorset.example/api/tracks/12/audio'
		]);
	});

	test('the playback rate is only a comment, and line breaks in names cannot add lines', () => {
		expect(lines).toContain('# rate 0.90');
		const sneaky = buildM3u8(
			{ ...SHEET, entries: [{ ...SHEET.entries[2], trackTitle: 'A\nhttps://evil.example/x' }] },
			online
		);
		expect(sneaky.split('\n').filter((l) => l.startsWith('https://'))).toEqual([
			'https://floorset.example/api/tracks/12/audio'
		]);
	});

	test('an entry without audio is only a comment: no #EXTINF without its URI', () => {
		const kit = buildM3u8(SHEET, (e) => (e.trackId === 11 ? null : `02 - ${e.trackTitle}.mp3`));
		const kitLines = kit.split('\n').filter((l) => l !== '');
		expect(kitLines.filter((l) => l.startsWith('#EXTINF:'))).toEqual([
			'#EXTINF:187,Mabel Ashgrove - Tin Roof, Rain'
		]);
		expect(kitLines).toContain('# missing audio: The Wrenhill Five - Hayloft Lanterns');
		expect(kitLines.at(-1)).toBe('02 - Tin Roof, Rain.mp3');
	});
});
