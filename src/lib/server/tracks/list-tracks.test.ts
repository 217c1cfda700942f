// The tracks list against a real SQLite: search, filters, sorts and keyset pages.
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { listQuerySchema } from '../../music/track-schemas';
import { dances, fits, tracks } from '../db/schema';
import { makeTestDb } from '../testing/test-db';
import { listTracks } from './list-tracks';

let t: ReturnType<typeof makeTestDb>;
beforeEach(() => {
	t = makeTestDb();
	const rows = [
		['Amber Fields', 'Odd Ralston', 'Hay', 122, 4],
		['barn owl', 'Odd Ralston', 'Hay', 90, 3],
		['Cider 100%', 'Vera Quill', 'Orchard', 100, 4],
		['Dust_Road', 'Vera Quill', 'Orchard', null, 4],
		['Evening Bell', 'Tamsin Orr', 'Bells', 180, 4],
		['Fiddle Waltz', 'Tamsin Orr', 'Bells', 88, 3]
	] as const;
	rows.forEach(([title, artist, album, bpm, meter], i) =>
		t.db
			.insert(tracks)
			.values({
				title,
				artist,
				album,
				bpm,
				meter,
				durationS: 100 + i,
				mimeType: 'audio/mpeg',
				fileSize: 1,
				sha256: String(i).padStart(64, '0'),
				storageKey: `audio/${String(i).padStart(64, '0')}.mp3`,
				createdAt: new Date(2026, 0, 1 + i)
			})
			.run()
	);
	t.db
		.insert(dances)
		.values([
			{ name: 'Loop Step', counts: 32, walls: 4, level: 'beginner', bpmMin: 110, bpmMax: 130 },
			{
				name: 'Slow Turn',
				counts: 48,
				walls: 2,
				level: 'improver',
				meter: 3,
				bpmMin: 84,
				bpmMax: 96
			}
		])
		.run();
	t.db
		.insert(fits)
		.values([
			{ trackId: 1, danceId: 1, verdict: 'fits' },
			{ trackId: 3, danceId: 1, verdict: 'fits-at-rate', rate: 1.1 },
			{ trackId: 5, danceId: 1, verdict: 'does-not-fit' },
			{ trackId: 6, danceId: 2, verdict: 'fits' }
		])
		.run();
});
afterEach(() => t.cleanup());

const list = (q: Record<string, string> = {}) => listTracks(listQuerySchema.parse(q));
const titles = (q: Record<string, string> = {}) => list(q).items.map((i) => i.title);

describe('listTracks', () => {
	test('sorts by title ignoring case, by default', () => {
		expect(titles()).toEqual([
			'Amber Fields',
			'barn owl',
			'Cider 100%',
			'Dust_Road',
			'Evening Bell',
			'Fiddle Waltz'
		]);
		expect(titles({ sort: '-title' })[0]).toBe('Fiddle Waltz');
	});

	test('sorts by tempo; a track without one sorts first', () => {
		expect(list({ sort: 'bpm' }).items.map((i) => i.bpm)).toEqual([null, 88, 90, 100, 122, 180]);
		expect(list({ sort: '-bpm' }).items.map((i) => i.bpm)).toEqual([180, 122, 100, 90, 88, null]);
		expect(titles({ sort: '-createdAt' })[0]).toBe('Fiddle Waltz');
	});

	test('searches title, artist and album; % and _ are plain characters', () => {
		expect(titles({ q: 'quill' })).toEqual(['Cider 100%', 'Dust_Road']);
		expect(titles({ q: 'bells' })).toEqual(['Evening Bell', 'Fiddle Waltz']);
		expect(titles({ q: '0%' })).toEqual(['Cider 100%']);
		expect(titles({ q: '_' })).toEqual(['Dust_Road']);
	});

	test('filters by tempo range and meter', () => {
		expect(titles({ bpmMin: '89', bpmMax: '122' })).toEqual([
			'Amber Fields',
			'barn owl',
			'Cider 100%'
		]);
		expect(titles({ meter: '3' })).toEqual(['barn owl', 'Fiddle Waltz']);
	});

	test('filters by the team’s verdicts for a dance', () => {
		expect(titles({ dance: '1' })).toEqual(['Amber Fields', 'Cider 100%']);
		expect(titles({ dance: '1', verdict: 'does-not-fit' })).toEqual(['Evening Bell']);
		expect(titles({ dance: '1', verdict: 'unjudged' })).toEqual([
			'barn owl',
			'Dust_Road',
			'Fiddle Waltz'
		]);
		expect(titles({ verdict: 'fits' })).toEqual(['Amber Fields', 'Fiddle Waltz']);
		expect(titles({ verdict: 'unjudged' })).toEqual(['barn owl', 'Dust_Road']);
	});

	test('total counts every match; keyset pages cover them once each', () => {
		for (const sort of ['bpm', '-bpm', 'title', '-createdAt', 'artist', '-durationS']) {
			const seen: number[] = [];
			let cursor: string | null = null;
			let pages = 0;
			do {
				const page = list({ sort, limit: '4', ...(cursor ? { cursor } : {}) });
				expect(page.total).toBe(6);
				seen.push(...page.items.map((i) => i.id));
				cursor = page.nextCursor;
				pages++;
			} while (cursor && pages < 10);
			expect(pages).toBe(2);
			expect(new Set(seen).size).toBe(6);
			expect(seen).toEqual(list({ sort, limit: '10' }).items.map((i) => i.id));
		}
	});

	test('a page in the middle of equal keys continues after the last id', () => {
		const first = list({ sort: 'artist', limit: '1' });
		const second = list({ sort: 'artist', limit: '1', cursor: first.nextCursor! });
		expect([first.items[0].artist, second.items[0].artist]).toEqual(['Odd Ralston', 'Odd Ralston']);
		expect(second.items[0].id).toBeGreaterThan(first.items[0].id);
	});

	test('a cursor for another sort, or a forged one, is refused', () => {
		const page = list({ sort: 'bpm', limit: '2' });
		expect(() => list({ sort: 'title', cursor: page.nextCursor! })).toThrow(/cursor/);
		expect(() => list({ cursor: 'bm90LWpzb24' })).toThrow(/cursor/);
	});

	test('the query rejects a limit over 500 and an unknown sort', () => {
		expect(listQuerySchema.safeParse({ limit: '501' }).success).toBe(false);
		expect(listQuerySchema.safeParse({ sort: 'id; drop table tracks' }).success).toBe(false);
	});
});
