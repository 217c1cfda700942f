// Integration tests of evenings against a real SQLite (makeTestDb, real migrations).
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { eveningCreate, eveningPatch } from '../../schemas/evening';
import { db } from '../db';
import { makeTestDb } from '../testing/test-db';
import { EveningError } from './errors';
import { listEvenings, loadEvening } from './load';
import { seedLike } from './test-fixture';
import { createEvening, deleteEvening, updateEvening } from './write';

let cleanup: () => void;
beforeEach(() => {
	const t = makeTestDb();
	cleanup = t.cleanup;
	seedLike(t.db);
});
afterEach(() => cleanup());

const base = {
	title: 'Hollyhock Hop',
	venue: 'Tansy Lane Hall',
	startsAt: '2027-02-05T19:00:00Z',
	endsAt: '2027-02-05T22:00:00Z',
	crowd: 'mixed',
	sections: [
		{
			kind: 'lesson',
			title: 'Lesson',
			startsAt: '2027-02-05T19:00:00Z',
			endsAt: '2027-02-05T19:30:00Z'
		},
		{ kind: 'open-floor', startsAt: '2027-02-05T19:30:00Z', endsAt: '2027-02-05T21:50:00Z' },
		{ kind: 'last-dance', startsAt: '2027-02-05T21:50:00Z', endsAt: '2027-02-05T22:00:00Z' }
	]
};

function refusal(fn: () => unknown): EveningError {
	try {
		fn();
	} catch (e) {
		if (e instanceof EveningError) return e;
		throw e;
	}
	throw new Error('expected a refusal');
}

describe('evening CRUD', () => {
	test('create, read, list, update and delete', () => {
		const id = createEvening(eveningCreate.parse(base), null);
		const e = loadEvening(id)!;
		expect(e.title).toBe('Hollyhock Hop');
		expect(e.startsAt).toBe('2027-02-05T19:00:00.000Z');
		expect(e.sections.map((s) => s.kind)).toEqual(['lesson', 'open-floor', 'last-dance']);
		expect(e.status).toBe('draft');
		expect(listEvenings().map((x) => x.title)).toContain('Hollyhock Hop');
		expect(listEvenings(true).map((x) => x.title)).not.toContain('Hollyhock Hop');

		const lessonId = e.sections[0].id;
		updateEvening(
			id,
			eveningPatch.parse({
				title: 'Hollyhock Hop II',
				sections: [
					{
						...base.sections[0],
						id: lessonId,
						title: 'Longer lesson',
						endsAt: '2027-02-05T19:40:00Z'
					},
					{ ...base.sections[1], startsAt: '2027-02-05T19:40:00Z' }
				]
			})
		);
		const after = loadEvening(id)!;
		expect(after.title).toBe('Hollyhock Hop II');
		expect(after.version).toBe(e.version + 1);
		expect(after.sections).toHaveLength(2);
		// The lesson kept its row (and so any run-order links to it).
		expect(after.sections[0]).toMatchObject({ id: lessonId, title: 'Longer lesson' });

		expect(deleteEvening(id)).toBe(true);
		expect(loadEvening(id)).toBeNull();
		expect(deleteEvening(id)).toBe(false);
	});

	test('the seeded-like demo evening loads with its six sections', () => {
		const e = loadEvening(1)!;
		expect(e.published).toBe(true);
		expect(e.sections).toHaveLength(6);
		expect(e.sections[0].danceName).toBe('Marrowby Lantern Waltz');
		expect(e.sections[0].teacherName).toBe('Dolores Fenwright');
		expect(e.timeZone).toBe('Europe/London');
	});

	test('a stale evening version is refused with 409', () => {
		const id = createEvening(eveningCreate.parse(base), null);
		updateEvening(id, eveningPatch.parse({ notes: 'first', version: 1 }));
		expect(
			refusal(() => updateEvening(id, eveningPatch.parse({ notes: 'second', version: 1 }))).status
		).toBe(409);
		expect(loadEvening(id)!.notes).toBe('first');
	});

	test('planner settings are read once: typed when valid, the defaults when not', () => {
		const settings = { mustPlay: [2, { danceId: 3 }], settings: { gapS: 12 } };
		const id = createEvening(eveningCreate.parse({ ...base, planSettings: settings }), null);
		expect(loadEvening(id)!.planSettings).toEqual(settings);
		// A value no write would store (a hand edit, an older build) is not passed on half-read.
		db()
			.$client.prepare('UPDATE evenings SET plan_settings = ? WHERE id = ?')
			.run(JSON.stringify({ settings: { gapS: 'long' } }), id);
		expect(loadEvening(id)!.planSettings).toEqual({});
	});
});

describe('validation', () => {
	test('a section outside the evening is refused', () => {
		const bad = structuredClone(base);
		bad.sections[2].endsAt = '2027-02-05T22:10:00Z';
		const e = refusal(() => createEvening(eveningCreate.parse(bad), null));
		expect(e.status).toBe(422);
		expect(e.message).toMatch(/outside the evening/);
	});

	test('overlapping sections are refused', () => {
		const bad = structuredClone(base);
		bad.sections[1].startsAt = '2027-02-05T19:20:00Z';
		const e = refusal(() => createEvening(eveningCreate.parse(bad), null));
		expect(e.status).toBe(422);
		expect(e.message).toMatch(/overlaps/);
	});

	test('an end before the start is refused, and nothing is written', () => {
		const before = listEvenings().length;
		const e = refusal(() =>
			createEvening(
				eveningCreate.parse({ ...base, endsAt: '2027-02-05T18:00:00Z', sections: [] }),
				null
			)
		);
		expect(e.message).toMatch(/end after it starts/);
		expect(listEvenings()).toHaveLength(before);
	});

	test('bad dates fail the schema', () => {
		expect(eveningCreate.safeParse({ ...base, startsAt: '5 Feb 2027' }).success).toBe(false);
		expect(eveningCreate.safeParse({ ...base, startsAt: '2027-02-30T19:00:00Z' }).success).toBe(
			false
		);
		expect(eveningPatch.safeParse({ colour: 'red' }).success).toBe(false);
	});

	test('shrinking an evening past its sections is refused', () => {
		const e = refusal(() =>
			updateEvening(1, eveningPatch.parse({ endsAt: '2026-12-11T22:00:00Z' }))
		);
		expect(e.status).toBe(422);
		expect(loadEvening(1)!.endsAt).toBe('2026-12-11T23:00:00.000Z');
	});

	test('an unknown dance in a lesson is refused', () => {
		const bad = structuredClone(base) as typeof base & { sections: { danceId?: number }[] };
		bad.sections[0].danceId = 99999;
		expect(refusal(() => createEvening(eveningCreate.parse(bad), null)).status).toBe(422);
	});
});
