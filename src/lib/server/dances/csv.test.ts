// CSV export and import against a real SQLite. The export is written with papaparse, so it is read
// back with csv-parse, a separate RFC 4180 parser (outside the project, sharing no code with
// papaparse), to check the file is well formed for a reader other than the writer.
import { parse } from 'csv-parse/sync';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { makeTestDb } from '../testing/test-db';
import { createDance, listDances } from './catalogue';
import { checkDanceCsv, CSV_COLUMNS, danceCsv, importDanceCsv } from './csv';
import type { DanceJson } from './dance-json';
import { aDance } from '../testing/rows';

let t: ReturnType<typeof makeTestDb>;
beforeEach(() => (t = makeTestDb()));
afterEach(() => t.cleanup());

const HEADER = 'name,counts,walls,level,bpmMin,bpmMax';

describe('CSV export', () => {
	test('reads back with csv-parse, quotes, line breaks and formula guards included', () => {
		createDance(
			aDance({
				name: 'Comma, "Quote" Stomp',
				notes: 'Line one\nline two',
				tags: [{ repetition: 2, afterCount: 16, lengthCounts: 4 }],
				restarts: [{ repetition: 4, afterCount: 24 }],
				wellKnown: true
			}),
			null
		);
		createDance(aDance({ name: '=Sum Shuffle', turn: null }), null);
		const text = danceCsv(listDances());
		// RFC 4180 §2: records end in CRLF.
		expect(text.split('\r\n')[0]).toBe(CSV_COLUMNS.join(','));
		// csv-parse throws on any quoting or column-count error (strict by default).
		const rows: Record<string, string>[] = parse(text, { columns: true, record_delimiter: '\r\n' });
		expect(rows).toHaveLength(2);
		const byName = Object.fromEntries(rows.map((r) => [r.name, r]));
		expect(byName['Comma, "Quote" Stomp']).toMatchObject({
			counts: '32',
			notes: 'Line one\nline two',
			tags: '2@16+4',
			restarts: '4@24',
			wellKnown: 'yes'
		});
		// A cell that a spreadsheet would run is guarded with an apostrophe (OWASP CSV Injection).
		expect(byName["'=Sum Shuffle"]).toBeDefined();
	});

	test('an exported catalogue imports back to the same dances', () => {
		createDance(
			aDance({ name: '=Sum Shuffle', tags: [{ repetition: 2, afterCount: 8, lengthCounts: 2 }] }),
			null
		);
		createDance(
			aDance({
				name: 'Plain Waltz',
				rhythm: 'waltz',
				meter: 3,
				bpmMin: 84,
				bpmMax: 96,
				formation: 'partner'
			}),
			null
		);
		const strip = (d: DanceJson) => ({ ...d, id: 0, version: 0, updatedAt: '' });
		const before = listDances().map(strip);
		const text = danceCsv(listDances());
		t.db.$client.exec('DELETE FROM dances');
		const result = importDanceCsv(text, null);
		expect(result).toEqual({ ok: true, imported: 2 });
		expect(listDances().map(strip)).toEqual(before);
	});
});

describe('CSV import', () => {
	test('writes nothing when any row is invalid, and names each bad row and field', () => {
		createDance(aDance({ name: 'Already Here' }), null);
		const text = [
			HEADER,
			'Good Row,32,4,beginner,100,120',
			'Bad Walls,32,3,beginner,100,120',
			'Bad Range,32,4,improver,130,120'
		].join('\n');
		const result = importDanceCsv(text, null);
		expect(result.ok).toBe(false);
		if (result.ok) return;
		const rows = result.check.rows;
		expect(rows.map((r) => r.line)).toEqual([2, 3, 4]);
		expect(rows[0].errors).toEqual([]);
		expect(rows[1].errors.join(' ')).toMatch(/walls/);
		expect(rows[2].errors.join(' ')).toMatch(/bpmMax/);
		expect(listDances().map((d) => d.name)).toEqual(['Already Here']);
	});

	test('reports missing columns for the whole file', () => {
		const check = checkDanceCsv('name,counts\nX,32');
		expect(check.valid).toBe(false);
		expect(check.fileErrors[0]).toMatch(/walls, level, bpmMin, bpmMax/);
	});

	test('reads tags, restarts, levels written with spaces and yes/no', () => {
		const check = checkDanceCsv(
			`${HEADER},tags,restarts,wellKnown\nNew One,48,2,Absolute beginner,96,104,"3@48+4; 5@48+4",6@24,yes`
		);
		expect(check.valid).toBe(true);
		expect(check.rows[0].dance).toMatchObject({
			level: 'absolute-beginner',
			tags: [
				{ repetition: 3, afterCount: 48, lengthCounts: 4 },
				{ repetition: 5, afterCount: 48, lengthCounts: 4 }
			],
			restarts: [{ repetition: 6, afterCount: 24 }],
			wellKnown: true
		});
	});

	test('formation: blank or missing is a line dance, a known word is kept, others refused', () => {
		const old = checkDanceCsv(`${HEADER}\nOld File,32,4,beginner,100,120`);
		expect(old.rows[0].dance?.formation).toBe('line');
		const check = checkDanceCsv(
			`${HEADER},formation\nPair Up,32,1,beginner,100,120,Partner\nRound,32,1,beginner,100,120,\nOdd,32,4,beginner,100,120,square`
		);
		expect(check.rows.map((r) => r.dance?.formation)).toEqual(['partner', 'line', undefined]);
		expect(check.rows[2].errors.join(' ')).toMatch(/^formation: /);
	});

	test('a malformed tag is that row’s error', () => {
		const check = checkDanceCsv(`${HEADER},tags\nOdd Tag,32,4,beginner,100,120,after 16`);
		expect(check.valid).toBe(false);
		expect(check.rows[0].errors[0]).toMatch(/^tags:/);
	});
});
