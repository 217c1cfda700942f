// The catalogue as CSV (RFC 4180, via papaparse) and back. Import is all or nothing: every row
// is checked first, and nothing is written while any row has a problem.
import Papa from 'papaparse';
import { danceSchema, type DanceInput } from '../../schemas/dance';
import { db } from '../db';
import { dances } from '../db/schema';
import { columnsOf, type DanceJson } from './dance-json';

export const CSV_COLUMNS = [
	'name',
	'counts',
	'walls',
	'level',
	'rhythm',
	'meter',
	'bpmMin',
	'bpmMax',
	'turn',
	'tags',
	'restarts',
	'notes',
	'choreographer',
	'wellKnown',
	'formation'
] as const;

export const REQUIRED_COLUMNS = ['name', 'counts', 'walls', 'level', 'bpmMin', 'bpmMax'] as const;

export const MAX_IMPORT_ROWS = 2000;

/** Tags as "repetition@count+length" and restarts as "repetition@count", joined by ";". */
export const tagsText = (tags: DanceJson['tags']) =>
	tags.map((t) => `${t.repetition}@${t.afterCount}+${t.lengthCounts}`).join(';');
export const restartsText = (restarts: DanceJson['restarts']) =>
	restarts.map((r) => `${r.repetition}@${r.afterCount}`).join(';');

export function danceCsv(list: readonly DanceJson[]): string {
	const rows = list.map((d) => ({
		...Object.fromEntries(CSV_COLUMNS.map((c) => [c, ''])),
		name: d.name,
		counts: d.counts,
		walls: d.walls,
		level: d.level,
		rhythm: d.rhythm,
		meter: d.meter,
		bpmMin: d.bpmMin,
		bpmMax: d.bpmMax,
		turn: d.turn ?? '',
		tags: tagsText(d.tags),
		restarts: restartsText(d.restarts),
		notes: d.notes,
		choreographer: d.choreographer,
		wellKnown: d.wellKnown ? 'yes' : 'no',
		formation: d.formation
	}));
	// escapeFormulae keeps a spreadsheet from running a cell that begins with = + - @ (OWASP,
	// "CSV Injection"); the import takes the guarding apostrophe off again.
	return Papa.unparse(
		{ fields: [...CSV_COLUMNS], data: rows.map((r) => CSV_COLUMNS.map((c) => r[c])) },
		{ newline: '\r\n', escapeFormulae: true }
	);
}

const unguard = (s: string) => (/^'[=+\-@\t\r]/.test(s) ? s.slice(1) : s);

function numberOr(text: string): number | undefined {
	const t = text.trim();
	if (t === '') return undefined;
	const n = Number(t.replace(',', '.'));
	return Number.isFinite(n) ? n : NaN;
}

/** "2@16+4;5@8+2" → tags; undefined entries make the schema report the row. */
function parseList(text: string, withLength: boolean) {
	const pattern = withLength ? /^(\d+)@(\d+)\+(\d+)$/ : /^(\d+)@(\d+)$/;
	const items = text
		.split(';')
		.map((s) => s.trim())
		.filter(Boolean);
	const out: { repetition: number; afterCount: number; lengthCounts?: number }[] = [];
	for (const item of items) {
		const m = pattern.exec(item.replace(/\s+/g, ''));
		if (!m)
			return {
				error: `"${item}" is not ${withLength ? 'repetition@count+length' : 'repetition@count'}`
			};
		out.push({
			repetition: Number(m[1]),
			afterCount: Number(m[2]),
			...(withLength ? { lengthCounts: Number(m[3]) } : {})
		});
	}
	return { items: out };
}

const YES = new Set(['yes', 'y', 'true', '1']);
const NO = new Set(['no', 'n', 'false', '0', '']);

export interface CsvRow {
	/** The row's line in the file (the header is line 1). */
	line: number;
	name: string;
	errors: string[];
	dance?: DanceInput;
}

/** One CSV record to a checked dance, or the problems in words. */
function checkRecord(record: Record<string, string>, line: number): CsvRow {
	const cell = (c: string) => unguard((record[c] ?? '').trim());
	const errors: string[] = [];
	const tags = parseList(cell('tags'), true);
	const restarts = parseList(cell('restarts'), false);
	if (tags.error) errors.push(`tags: ${tags.error}`);
	if (restarts.error) errors.push(`restarts: ${restarts.error}`);
	const known = cell('wellKnown').toLowerCase();
	if (!YES.has(known) && !NO.has(known)) errors.push('wellKnown: write yes or no');
	const raw = {
		name: cell('name'),
		counts: numberOr(cell('counts')),
		walls: numberOr(cell('walls')),
		level: cell('level').toLowerCase().replace(/\s+/g, '-') || undefined,
		rhythm: cell('rhythm').toLowerCase().replace(/\s+/g, '-') || undefined,
		meter: numberOr(cell('meter')),
		bpmMin: numberOr(cell('bpmMin')),
		bpmMax: numberOr(cell('bpmMax')),
		turn: cell('turn').toLowerCase() || null,
		// A file from before formations, or a blank cell: a line dance, as most are.
		formation: cell('formation').toLowerCase() || undefined,
		tags: tags.items ?? [],
		restarts: restarts.items ?? [],
		notes: (record.notes ?? '').replace(/^'(?=[=+\-@\t\r])/, ''),
		choreographer: cell('choreographer'),
		wellKnown: YES.has(known)
	};
	const parsed = danceSchema.safeParse(raw);
	if (!parsed.success) {
		for (const issue of parsed.error.issues) {
			errors.push(`${issue.path.join('.') || 'row'}: ${issue.message}`);
		}
	}
	return {
		line,
		name: raw.name,
		errors,
		dance: parsed.success && errors.length === 0 ? parsed.data : undefined
	};
}

export interface CsvCheck {
	/** Problems with the file as a whole (no header, missing columns, too many rows). */
	fileErrors: string[];
	rows: CsvRow[];
	valid: boolean;
}

export function checkDanceCsv(text: string): CsvCheck {
	const result = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
		header: true,
		skipEmptyLines: 'greedy',
		transformHeader: (h) => h.trim()
	});
	const fileErrors: string[] = [];
	const fields = result.meta.fields ?? [];
	const missing = REQUIRED_COLUMNS.filter((c) => !fields.includes(c));
	if (missing.length) fileErrors.push(`Missing columns: ${missing.join(', ')}.`);
	const unknown = fields.filter((f) => !(CSV_COLUMNS as readonly string[]).includes(f));
	if (unknown.length) fileErrors.push(`Unknown columns: ${unknown.join(', ')}.`);
	if (result.data.length === 0) fileErrors.push('The file has no dances in it.');
	if (result.data.length > MAX_IMPORT_ROWS) {
		fileErrors.push(`Import at most ${MAX_IMPORT_ROWS} dances at a time.`);
	}
	const rows = fileErrors.length ? [] : result.data.map((record, i) => checkRecord(record, i + 2));
	// Quoting problems papaparse found belong to a row.
	for (const e of result.errors) {
		const row = rows[e.row ?? -1];
		if (row) row.errors.push(`CSV: ${e.message}`);
		else fileErrors.push(`CSV: ${e.message}`);
	}
	for (const row of rows) if (row.errors.length) row.dance = undefined;
	const valid = fileErrors.length === 0 && rows.every((r) => r.dance && r.errors.length === 0);
	return { fileErrors, rows, valid };
}

/** Writes every dance of a valid file in one transaction; an invalid file writes nothing. */
export function importDanceCsv(
	text: string,
	userId: number | null
): { ok: true; imported: number } | { ok: false; check: CsvCheck } {
	const check = checkDanceCsv(text);
	if (!check.valid) return { ok: false, check };
	db().transaction((tx) => {
		for (const row of check.rows) {
			tx.insert(dances)
				.values({ ...columnsOf(row.dance!), createdBy: userId })
				.run();
		}
	});
	return { ok: true, imported: check.rows.length };
}
