// Integration tests of the catalogue against a real SQLite with the real migrations.
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { danceSchema } from '../../schemas/dance';
import { makeTestDb } from '../testing/test-db';
import { createDance, deleteDance, getDance, listDances, updateDance } from './catalogue';
import { aDance, aUser } from '../testing/rows';

let t: ReturnType<typeof makeTestDb>;
beforeEach(() => (t = makeTestDb()));
afterEach(() => t.cleanup());

describe('dance catalogue', () => {
	test('creates a dance with tags and restarts kept as events and sent back as two lists', () => {
		const user = aUser(t.db);
		const d = createDance(
			aDance({
				counts: 32,
				tags: [{ repetition: 3, afterCount: 32, lengthCounts: 4 }],
				restarts: [{ repetition: 5, afterCount: 16 }]
			}),
			user
		);
		expect(d.version).toBe(1);
		expect(d.tags).toEqual([{ repetition: 3, afterCount: 32, lengthCounts: 4 }]);
		expect(d.restarts).toEqual([{ repetition: 5, afterCount: 16 }]);
		expect(d.stepSheetUrl).toBeNull();
		expect(getDance(d.id)?.name).toBe('Pebbleford Ramble');
	});

	test('POST needs only name, counts, walls, level and the range; the rest has defaults', () => {
		const parsed = danceSchema.parse({
			name: 'Tiny One',
			counts: 16,
			walls: 1,
			level: 'advanced',
			bpmMin: 90,
			bpmMax: 100
		});
		expect(parsed).toMatchObject({ rhythm: 'other', meter: 4, turn: null, tags: [], notes: '' });
	});

	test('refuses a tempo range whose slowest is not below its fastest', () => {
		const r = danceSchema.safeParse(aDance({ bpmMin: 120, bpmMax: 120 }));
		expect(r.success).toBe(false);
		expect(r.error?.issues[0].path).toEqual(['bpmMax']);
	});

	test('filters by words, level, rhythm, meter and a tempo inside the range', () => {
		createDance(aDance({ name: 'Alpha Glide', level: 'beginner', bpmMin: 100, bpmMax: 110 }), null);
		createDance(
			aDance({ name: 'Beta 100% Waltz', level: 'improver', rhythm: 'waltz', meter: 3 }),
			null
		);
		expect(listDances({ q: 'glide' }).map((d) => d.name)).toEqual(['Alpha Glide']);
		// A typed % is a character, not a wildcard.
		expect(listDances({ q: '0%' }).map((d) => d.name)).toEqual(['Beta 100% Waltz']);
		expect(listDances({ level: 'improver' }).map((d) => d.name)).toEqual(['Beta 100% Waltz']);
		expect(listDances({ meter: 3 }).length).toBe(1);
		expect(listDances({ rhythm: 'shuffle' }).map((d) => d.name)).toEqual(['Alpha Glide']);
		expect(listDances({ tempo: 105 }).map((d) => d.name)).toEqual(['Alpha Glide']);
		expect(listDances({ tempo: 125 }).map((d) => d.name)).toEqual(['Beta 100% Waltz']);
	});

	test('filters by counts, walls and formation', () => {
		createDance(aDance({ name: 'Gamma Step', counts: 48, walls: 2 }), null);
		createDance(aDance({ name: 'Delta Pair', counts: 32, walls: 1, formation: 'partner' }), null);
		expect(listDances({ counts: 48 }).map((d) => d.name)).toEqual(['Gamma Step']);
		expect(listDances({ walls: 1 }).map((d) => d.name)).toEqual(['Delta Pair']);
		expect(listDances({ formation: 'partner', counts: 48 })).toEqual([]);
		expect(listDances({ formation: 'line' }).map((d) => d.name)).toEqual(['Gamma Step']);
	});

	test('PATCH with the current version saves and bumps it; a stale version is a 409', () => {
		const d = createDance(aDance(), null);
		const first = updateDance(d.id, { version: 1, name: 'Renamed Ramble', bpmMax: 130 });
		expect(first.ok && first.dance).toMatchObject({
			name: 'Renamed Ramble',
			bpmMax: 130,
			version: 2
		});
		const stale = updateDance(d.id, { version: 1, name: 'Lost Edit' });
		expect(stale.ok).toBe(false);
		expect(!stale.ok && stale.status).toBe(409);
		expect(getDance(d.id)?.name).toBe('Renamed Ramble');
	});

	test('PATCH is checked against the merged dance (min below max) and 404 for no dance', () => {
		const d = createDance(aDance({ bpmMin: 110, bpmMax: 126 }), null);
		const bad = updateDance(d.id, { version: 1, bpmMin: 130 });
		expect(!bad.ok && bad.status).toBe(422);
		expect(getDance(d.id)?.version).toBe(1);
		const missing = updateDance(9999, { version: 1 });
		expect(!missing.ok && missing.status).toBe(404);
	});

	test('deletes a dance', () => {
		const d = createDance(aDance(), null);
		expect(deleteDance(d.id).deleted).toBe(true);
		expect(getDance(d.id)).toBeNull();
		expect(deleteDance(d.id).deleted).toBe(false);
	});
});
