// The evening form's wall-clock times in the club's zone, against a real SQLite for the write.
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { makeTestDb } from '../testing/test-db';
import { readEveningForm, valuesOf } from './form';
import { loadEvening } from './load';
import { createEvening } from './write';

let cleanup: () => void;
beforeEach(() => {
	cleanup = makeTestDb().cleanup;
});
afterEach(() => {
	cleanup();
	delete process.env.CLUB_TZ;
});

function form(fields: Record<string, string>, sections: string[][]) {
	const f = new FormData();
	for (const [k, v] of Object.entries(fields)) f.set(k, v);
	for (const [kind, title, start, end] of sections) {
		f.append('section-id', '');
		f.append('section-kind', kind);
		f.append('section-title', title);
		f.append('section-start', start);
		f.append('section-end', end);
		f.append('section-dance', '');
		f.append('section-teacher', '');
	}
	return f;
}

const base = {
	title: 'Midsummer Barn Night',
	venue: 'Tansy Lane Hall',
	date: '2027-06-25',
	start: '19:30',
	end: '00:30',
	crowd: 'mixed',
	notes: ''
};

describe('the evening form', () => {
	test('summer wall times in London are BST, and an end after midnight is the next day', () => {
		const read = readEveningForm(
			form(base, [
				['open-floor', 'Open floor', '19:30', '23:50'],
				['last-dance', 'Last dance', '23:50', '00:30']
			])
		);
		expect(read.ok).toBe(true);
		if (!read.ok) return;
		// 19:30 BST = 18:30 UTC; 00:30 BST on the 26th = 23:30 UTC on the 25th (IANA tz database).
		expect(new Date(read.input.startsAt).toISOString()).toBe('2027-06-25T18:30:00.000Z');
		expect(new Date(read.input.endsAt).toISOString()).toBe('2027-06-25T23:30:00.000Z');
		const id = createEvening(read.input, null);
		const values = valuesOf(loadEvening(id)!);
		expect(values).toMatchObject({ date: '2027-06-25', start: '19:30', end: '00:30' });
		expect(values.sections.map((s) => [s.start, s.end])).toEqual([
			['19:30', '23:50'],
			['23:50', '00:30']
		]);
	});

	test('the club zone is a setting: the same wall time in America/Denver is seven hours later', () => {
		process.env.CLUB_TZ = 'America/Denver';
		const read = readEveningForm(form({ ...base, date: '2027-01-08', end: '22:00' }, []));
		expect(read.ok && new Date(read.input.startsAt).toISOString()).toBe('2027-01-09T02:30:00.000Z');
	});

	test('overlapping sections and sections outside the evening are refused in words', () => {
		const overlap = readEveningForm(
			form({ ...base, end: '22:00' }, [
				['lesson', 'Lesson', '19:30', '20:15'],
				['open-floor', 'Open floor', '20:00', '22:00']
			])
		);
		expect(overlap).toMatchObject({ ok: false, message: expect.stringMatching(/overlaps/) });
		const outside = readEveningForm(
			form({ ...base, end: '22:00' }, [['open-floor', 'Open floor', '21:00', '22:30']])
		);
		expect(outside).toMatchObject({ ok: false, message: expect.stringMatching(/outside/) });
		const bad = readEveningForm(form({ ...base, date: 'soon' }, []));
		expect(bad).toMatchObject({ ok: false, message: 'Give a date.' });
		// The values come back so the form shows what was typed.
		expect(bad.values.title).toBe('Midsummer Barn Night');
	});

	test('"a rest after every N minutes of dancing" is off when empty, kept, and checked', () => {
		const sections = [['open-floor', 'Open floor', '19:30', '22:00']];
		const off = readEveningForm(form({ ...base, end: '22:00' }, sections));
		const mix = { partnerEvery: 3, partnerBackToBack: false };
		expect(off.ok && off.input.planSettings?.settings).toEqual({ breakEveryMin: 0, ...mix });
		const on = readEveningForm(form({ ...base, end: '22:00', restEveryMin: '40' }, sections));
		expect(on.ok && on.input.planSettings?.settings).toEqual({ breakEveryMin: 40, ...mix });
		if (!on.ok) return;
		const id = createEvening(on.input, null);
		expect(valuesOf(loadEvening(id)!).restEveryMin).toBe('40');
		const bad = readEveningForm(form({ ...base, end: '22:00', restEveryMin: '5' }, sections));
		expect(bad).toMatchObject({ ok: false, message: /10 minutes/ });
	});
	test('the line and partner mix: one after every 3 by default, kept, and checked', () => {
		const sections = [['open-floor', 'Open floor', '19:30', '22:00']];
		const set = readEveningForm(
			form({ ...base, end: '22:00', partnerEvery: '2', partnerBackToBack: 'on' }, sections)
		);
		expect(set.ok && set.input.planSettings?.settings).toMatchObject({
			partnerEvery: 2,
			partnerBackToBack: true
		});
		if (!set.ok) return;
		const back = valuesOf(loadEvening(createEvening(set.input, null))!);
		expect(back).toMatchObject({ partnerEvery: '2', partnerBackToBack: true });
		const bad = readEveningForm(form({ ...base, end: '22:00', partnerEvery: '40' }, sections));
		expect(bad).toMatchObject({ ok: false, message: /12 line dances/ });
	});
});
