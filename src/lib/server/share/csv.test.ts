import Papa from 'papaparse';
import { describe, expect, test } from 'vitest';
import { buildCsv, csvField, CSV_COLUMNS } from './csv';
import { SHEET } from '../testing/sheet';

// Read back with papaparse, a general-purpose CSV parser (independent of our writer), in the
// strict RFC 4180 form: comma, double-quote quoting, CRLF records.
const parse = (text: string) =>
	Papa.parse<string[]>(text, { delimiter: ',', newline: '\r\n', quoteChar: '"', header: false });

describe('CSV export (RFC 4180)', () => {
	const text = buildCsv(SHEET);
	const { data, errors } = parse(text);
	const rows = data.filter((r) => r.length > 1);

	test('parses without errors, one record per entry after the header', () => {
		expect(errors).toEqual([]);
		expect(rows[0]).toEqual([...CSV_COLUMNS]);
		expect(rows).toHaveLength(SHEET.entries.length + 1);
		for (const r of rows) expect(r).toHaveLength(14);
	});

	test('every record ends with CRLF, and no bare LF appears outside quotes (RFC 4180 §2.1–2.2)', () => {
		expect(text.endsWith('\r\n')).toBe(true);
		// Outside quoted fields every LF is preceded by CR.
		const unquoted = text.replace(/"(?:[^"]|"")*"/g, '');
		expect(unquoted.match(/(?<!\r)\n/g)).toBeNull();
	});

	test('commas, quotes and line breaks survive the round trip (RFC 4180 §2.6–2.7)', () => {
		const teach = rows[1];
		expect(teach[12]).toBe('Walk it twice, then "with music"');
		const third = rows[3];
		expect(third[3]).toBe('Gorse, Gate & Gallop');
		expect(third[5]).toBe('Tin Roof, Rain');
		// A text cell that would run as a formula is defused with an apostrophe (OWASP, from memory).
		expect(third[12]).toBe("'=not a formula\nsecond line");
		// The formation last, so a sheet that reads the older columns by position still works.
		expect(rows.slice(1).map((r) => r[13])).toEqual(['line', 'line', 'partner', '', '']);
	});

	test('figures: start time, effective BPM = BPM × rate, duration in whole seconds', () => {
		const [, teach, slowed, full, pause] = rows;
		expect(teach.slice(0, 5)).toEqual(['1', '19:00', 'teach', 'Pebble Lane Stroll', 'Beginner']);
		// Plain arithmetic: 120 BPM × 0.90 = 108 BPM; 19:00 + 1200 s = 19:20.
		expect(slowed[1]).toBe('19:20');
		expect(slowed.slice(7, 10)).toEqual(['120', '0.90', '108']);
		// 168.25 rounds to 168.3 at one decimal; 19:00 + 1424 s = 19:23:44 → 19:23.
		expect(full[1]).toBe('19:23');
		expect(full.slice(7, 11)).toEqual(['168.3', '1.00', '168.3', '187']);
		expect(full[11]).toBe('no');
		expect(teach[11]).toBe('yes');
		expect(pause.slice(2, 4)).toEqual(['break', '']);
		expect(pause[7]).toBe('');
	});

	test('field quoting rules', () => {
		expect(csvField('plain')).toBe('plain');
		expect(csvField('a,b')).toBe('"a,b"');
		expect(csvField('say "hi"')).toBe('"say ""hi"""');
		expect(csvField('line\r\nbreak')).toBe('"line\r\nbreak"');
		expect(csvField(null)).toBe('');
		expect(csvField(-3)).toBe('-3');
		expect(csvField('+44')).toBe("'+44");
	});
});
