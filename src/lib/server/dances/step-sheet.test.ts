// Step sheets: recognised by their bytes (ISO 32000-1 §7.5.2: a PDF file begins "%PDF-"),
// size-limited, stored under sheets/<sha256>.pdf and removed when no dance uses them.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { diskStorage, useStorage, type Storage } from '../storage';
import { makeTestDb } from '../testing/test-db';
import { createDance, deleteDance, getDance } from './catalogue';
import { attachSheet, checkSheet, detachSheet, forgetSheet, sheetName } from './step-sheet';
import { aDance } from '../testing/rows';

const pdf = (body = 'invented steps') => new TextEncoder().encode(`%PDF-1.4\n${body}\n%%EOF\n`);

let t: ReturnType<typeof makeTestDb>;
let dir: string;
let store: Storage;
beforeEach(() => {
	t = makeTestDb();
	dir = mkdtempSync(join(tmpdir(), 'floorset-sheets-'));
	store = diskStorage(dir);
	useStorage(store);
});
afterEach(() => {
	useStorage(undefined);
	rmSync(dir, { recursive: true, force: true });
	t.cleanup();
});

describe('step sheets', () => {
	test('accepts a PDF by its bytes and refuses anything else, whatever its name', () => {
		expect(checkSheet(pdf())).toEqual({ ok: true });
		const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
		expect(checkSheet(png)).toMatchObject({ ok: false, error: 'A step sheet must be a PDF file.' });
		expect(checkSheet(new TextEncoder().encode('%PDF'))).toMatchObject({ ok: false });
		expect(checkSheet(new Uint8Array())).toMatchObject({ ok: false });
		expect(checkSheet(pdf('x'.repeat(2000)), 1000)).toMatchObject({ ok: false });
	});

	test('keeps a safe download name', () => {
		expect(sheetName('../../etc/passwd')).toBe('....etcpasswd.pdf');
		expect(sheetName('Ramble steps.PDF')).toBe('Ramble steps.pdf');
		expect(sheetName('"";')).toBe('step-sheet.pdf');
	});

	test('stores under its hash, replaces, and removes a sheet no dance uses', async () => {
		const d = createDance(aDance(), null);
		expect((await attachSheet(d.id, { bytes: pdf('one'), name: 'one.pdf' })).ok).toBe(true);
		const first = await store.keys('sheets');
		expect(first).toHaveLength(1);
		expect(first[0]).toMatch(/^sheets\/[a-f0-9]{64}\.pdf$/);
		expect(getDance(d.id)).toMatchObject({
			stepSheetUrl: `/api/dances/${d.id}/sheet`,
			stepSheetName: 'one.pdf',
			version: 2
		});
		await attachSheet(d.id, { bytes: pdf('two'), name: 'two.pdf' });
		const second = await store.keys('sheets');
		expect(second).toHaveLength(1);
		expect(second[0]).not.toBe(first[0]);
		await detachSheet(d.id);
		expect(await store.keys('sheets')).toEqual([]);
		expect(getDance(d.id)?.stepSheetUrl).toBeNull();
	});

	test('a sheet shared by two dances stays until the last one goes', async () => {
		const a = createDance(aDance({ name: 'First' }), null);
		const b = createDance(aDance({ name: 'Second' }), null);
		await attachSheet(a.id, { bytes: pdf(), name: 'same.pdf' });
		await attachSheet(b.id, { bytes: pdf(), name: 'same.pdf' });
		await forgetSheet(deleteDance(a.id).sheetKey);
		expect(await store.keys('sheets')).toHaveLength(1);
		await forgetSheet(deleteDance(b.id).sheetKey);
		expect(await store.keys('sheets')).toEqual([]);
	});
});
