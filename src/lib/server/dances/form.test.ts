// The dance form's strings to checked fields, and errors pointed at the row a person typed.
import { describe, expect, test } from 'vitest';
import { checkDanceForm } from './form';

function form(fields: [string, string][]): FormData {
	const f = new FormData();
	for (const [k, v] of fields) f.append(k, v);
	return f;
}

const BASE: [string, string][] = [
	['name', 'Lindenmoor Line'],
	['counts', '48'],
	['walls', '2'],
	['level', 'improver'],
	['rhythm', 'waltz'],
	['meter', '3'],
	['bpmMin', '84'],
	['bpmMax', '96'],
	['turn', '']
];

describe('dance form', () => {
	test('reads numbers, an empty turn as none, and tag and restart rows in order', () => {
		const r = checkDanceForm(
			form([
				...BASE,
				['eventKind', 'restart'],
				['eventRepetition', '4'],
				['eventAfterCount', '24'],
				['eventLength', ''],
				['eventKind', 'tag'],
				['eventRepetition', '2'],
				['eventAfterCount', '48'],
				['eventLength', '6'],
				['wellKnown', 'on']
			])
		);
		expect(r.ok).toBe(true);
		if (!r.ok) return;
		expect(r.data).toMatchObject({
			counts: 48,
			walls: 2,
			meter: 3,
			turn: null,
			wellKnown: true,
			tags: [{ repetition: 2, afterCount: 48, lengthCounts: 6 }],
			restarts: [{ repetition: 4, afterCount: 24 }]
		});
	});

	test('a bad second row is reported on that row, and the typed values come back', () => {
		const r = checkDanceForm(
			form([
				...BASE,
				['eventKind', 'tag'],
				['eventRepetition', '2'],
				['eventAfterCount', '48'],
				['eventLength', '4'],
				['eventKind', 'restart'],
				['eventRepetition', '3'],
				['eventAfterCount', '60'],
				['eventLength', '']
			])
		);
		expect(r.ok).toBe(false);
		if (r.ok) return;
		expect(Object.keys(r.errors)).toEqual(['events.1']);
		expect(r.values.events[1].afterCount).toBe('60');
	});

	test('an empty required number is "missing", not zero', () => {
		const r = checkDanceForm(form(BASE.map(([k, v]) => [k, k === 'counts' ? '' : v])));
		expect(r.ok).toBe(false);
		if (!r.ok) expect(r.errors.counts).toMatch(/counts/);
	});
});
