// Faults: the server is killed with SIGKILL in the middle of uploads, CSV imports and run-order
// saves, many times over. Afterwards SQLite's integrity check passes, no row lacks its file and no file its
// row (the start-up sweep removes orphans and says so in the log), and every track's file still
// hashes to the SHA-256 in its row.
import { expect, test } from '@playwright/test';
import Database from 'better-sqlite3';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { encodeWav, generateSong } from '../src/lib/synth/index';
import { kill, seedPrivate, signInCookie, startInstance, type Instance } from './support-server';

const ROUNDS = 8;
const KILL_AFTER_MS = [40, 150, 300, 500, 800, 1200, 2000, 3500];
const PORT = Number(process.env.E2E_PORT ?? 4173) + 50;

test.describe.configure({ mode: 'serial', timeout: 240_000 });

let dir: string;
test.beforeAll(async () => {
	dir = mkdtempSync(join(tmpdir(), 'floorset-faults-'));
	// A private database and upload folder, seeded the way `npm start` does.
	await seedPrivate(dir);
});
test.afterAll(() => rmSync(dir, { recursive: true, force: true }));

function wav(bpm: number, seed: number) {
	const song = generateSong({ bpm, meter: 4, durationS: 20, seed, sampleRate: 22050 });
	return encodeWav(song.samples, song.sampleRate);
}

async function upload(instance: Instance, cookie: string, bytes: Uint8Array, name: string) {
	const form = new FormData();
	form.set('file', new Blob([bytes as BlobPart], { type: 'audio/wav' }), name);
	form.set('analysis', JSON.stringify({ bpm: 120, source: 'detected', meter: 4 }));
	try {
		const res = await fetch(`${instance.base}/api/tracks`, {
			method: 'POST',
			headers: { cookie, origin: instance.base },
			body: form
		});
		return res.status;
	} catch {
		return 0; // the server died under us: expected
	}
}

const IMPORT_ROWS = 300;
function danceCsv(round: number) {
	const rows = Array.from(
		{ length: IMPORT_ROWS },
		(_, i) => `Faultline Stroll ${round}-${i},32,4,beginner,110,128`
	);
	return ['name,counts,walls,level,bpmMin,bpmMax', ...rows].join('\r\n');
}

async function importDances(instance: Instance, cookie: string, round: number) {
	try {
		const res = await fetch(`${instance.base}/dances/import?/import`, {
			method: 'POST',
			headers: {
				cookie,
				origin: instance.base,
				accept: 'application/json',
				'x-sveltekit-action': 'true',
				'content-type': 'application/x-www-form-urlencoded'
			},
			body: new URLSearchParams({ csv: danceCsv(round) }).toString()
		});
		return (await res.json()).type === 'success';
	} catch {
		return false;
	}
}

async function saveRunOrder(instance: Instance, cookie: string) {
	const headers = {
		cookie,
		origin: instance.base,
		accept: 'application/json',
		'content-type': 'application/json'
	};
	const url = `${instance.base}/api/evenings/1/run-order`;
	try {
		const current = await (await fetch(url, { headers })).json();
		const entries = current.entries.map((e: { locked: boolean }, i: number) =>
			i === 1 ? { ...e, locked: !e.locked } : e
		);
		const res = await fetch(url, {
			method: 'PUT',
			headers,
			body: JSON.stringify({ version: current.runOrderVersion, entries })
		});
		return res.status === 200;
	} catch {
		return false;
	}
}

test('SIGKILL during uploads and saves leaves no half-written rows or orphan files', async () => {
	const opts = {
		port: PORT,
		databaseUrl: join(dir, 'floorset.db'),
		uploadDir: join(dir, 'uploads')
	};
	let accepted = 0;
	let imports = 0;
	let saves = 0;
	let logs = '';
	const before = new Database(opts.databaseUrl, { readonly: true });
	const entriesBefore = before
		.prepare('select count(*) from run_order_entries where evening_id = 1')
		.pluck()
		.get() as number;
	before.close();
	for (let round = 0; round < ROUNDS; round++) {
		const instance = await startInstance(opts);
		const cookie = await signInCookie(instance.base, 'dj@floorset.test');
		const instructor = await signInCookie(instance.base, 'instructor@floorset.test');
		const organiser = await signInCookie(instance.base, 'organiser@floorset.test');
		const files = Array.from({ length: 6 }, (_, i) => wav(90 + round * 6 + i, round * 10 + i));
		const inFlight = files.map((bytes, i) =>
			upload(instance, cookie, bytes, `round-${round}-${i}.wav`)
		);
		const importing = importDances(instance, instructor, round);
		const saving = (async () => {
			let ok = 0;
			for (let i = 0; i < 20; i++) if (await saveRunOrder(instance, organiser)) ok++;
			return ok;
		})();
		// Kill at a different moment each round: before, during and after the writes.
		await new Promise((r) => setTimeout(r, KILL_AFTER_MS[round % KILL_AFTER_MS.length]));
		await kill(instance);
		const statuses = await Promise.all(inFlight);
		accepted += statuses.filter((s) => s === 201).length;
		if (await importing) imports++;
		saves += await saving;
		logs += instance.log();
	}

	// One last start: the sweep runs, then everything is checked with the server stopped.
	const last = await startInstance(opts);
	logs += last.log();
	await kill(last);

	const sqlite = new Database(opts.databaseUrl, { readonly: true });
	expect(sqlite.pragma('integrity_check', { simple: true })).toBe('ok');
	// Imports are all or nothing: the catalogue grew by whole files, at least the acknowledged ones.
	const imported = (sqlite.prepare('select count(*) from dances').pluck().get() as number) - 40;
	expect(imported % IMPORT_ROWS, 'no half-written import').toBe(0);
	expect(imported / IMPORT_ROWS).toBeGreaterThanOrEqual(imports);
	// A run-order save replaces the whole list or nothing: positions stay 0..n-1, none lost.
	const positions = sqlite
		.prepare('select position from run_order_entries where evening_id = 1 order by position')
		.pluck()
		.all() as number[];
	expect(positions).toEqual(Array.from({ length: entriesBefore }, (_, i) => i));
	const version = sqlite
		.prepare('select run_order_version from evenings where id = 1')
		.pluck()
		.get() as number;
	expect(version, 'every acknowledged save is in the database').toBeGreaterThanOrEqual(1 + saves);
	const rows = sqlite.prepare('select storage_key, sha256, file_size from tracks').all() as {
		storage_key: string;
		sha256: string;
		file_size: number;
	}[];
	sqlite.close();

	const audioDir = join(opts.uploadDir, 'audio');
	const files = readdirSync(audioDir);
	expect(
		files.filter((f) => f.endsWith('.part')),
		'no half-written files'
	).toEqual([]);
	const keys = new Set(rows.map((r) => r.storage_key));
	for (const f of files) expect(keys.has(`audio/${f}`), `file ${f} has a row`).toBe(true);
	for (const r of rows) {
		const path = join(opts.uploadDir, r.storage_key);
		expect(existsSync(path), `row ${r.storage_key} has its file`).toBe(true);
		const bytes = readFileSync(path);
		expect(bytes.length).toBe(r.file_size);
		expect(createHash('sha256').update(bytes).digest('hex')).toBe(r.sha256);
	}
	// Secrets never reach the logs.
	expect(logs).not.toContain('fault-test-secret');
	expect(logs).not.toContain('floorset-demo');
	// Every upload the server acknowledged survived the crash that followed it.
	expect(rows.length).toBeGreaterThanOrEqual(60 + accepted);
	console.log(
		`faults: ${ROUNDS} kills, ${accepted} uploads, ${imports} imports, ${saves} run-order saves acknowledged, ${rows.length} tracks after; ${
			logs.match(/Start-up sweep[^\n]*/g)?.join(' | ') ?? 'the sweep found nothing'
		}`
	);
	test.info().annotations.push({
		type: 'figures',
		description: `${ROUNDS} kills, ${accepted} uploads acknowledged, ${rows.length} tracks after; sweep: ${
			logs.match(/Start-up sweep[^\n]*/g)?.join(' | ') ?? 'nothing to remove'
		}`
	});
});
