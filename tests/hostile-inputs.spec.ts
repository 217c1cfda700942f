// Hostile input, as a table: uploads, forms, API bodies and query strings that a careless or
// malicious client might send. Each must get a clear 4xx with a message a person can read —
// never a 5xx — and leave every table and the upload folder exactly as they were. Runs on a
// private server (own port, database and uploads) so other tests' writes do not blur the counts.
import { expect, test } from '@playwright/test';
import Database from 'better-sqlite3';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { encodeWav, generateSong } from '../src/lib/synth/index';
import { kill, seedPrivate, signInCookie, startInstance, type Instance } from './support-server';

const PORT = Number(process.env.E2E_PORT ?? 4173) + 60;

type Body =
	| { json: unknown }
	| { raw: string; type: string }
	| { upload: Uint8Array; name: string; analysis?: string | null; type?: string }
	| { form: Record<string, string> };

interface Hostile {
	what: string;
	as: 'dj' | 'instructor' | 'organiser' | 'admin' | 'anon';
	method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
	path: string;
	body?: Body;
	status?: number;
}

const song = generateSong({ bpm: 120, meter: 4, durationS: 8, seed: 5, sampleRate: 22050 });
const goodWav = encodeWav(song.samples, song.sampleRate);
const text = new TextEncoder();
const okAnalysis = JSON.stringify({ bpm: 120, source: 'detected', meter: 4 });
const nested = (depth: number) => '['.repeat(depth) + ']'.repeat(depth);
const goodDance = {
	name: 'Hollowmere Hop',
	counts: 32,
	walls: 4,
	level: 'beginner',
	bpmMin: 100,
	bpmMax: 120
};

const TABLE: Hostile[] = [
	// Uploads (issue 3's list and issue 6's)
	{
		what: 'an empty file',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: new Uint8Array(), name: 'empty.mp3', analysis: okAnalysis }
	},
	{
		what: 'truncated audio',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: goodWav.slice(0, 600), name: 'cut.wav', analysis: okAnalysis }
	},
	{
		what: 'a text file renamed .mp3',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: {
			upload: text.encode('just some words, not music\n'.repeat(50)),
			name: 'song.mp3',
			analysis: okAnalysis
		}
	},
	{
		what: 'a renamed executable',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: {
			upload: new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, ...new Array(500).fill(0)]),
			name: 'tune.mp3',
			analysis: okAnalysis
		}
	},
	{
		what: 'a zip archive',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: {
			upload: new Uint8Array([0x50, 0x4b, 0x03, 0x04, 20, 0, 0, 0, ...new Array(500).fill(0)]),
			name: 'album.mp3',
			analysis: okAnalysis
		}
	},
	{
		what: 'an oversized file (over MAX_UPLOAD_MB)',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: new Uint8Array(2.2 * 1024 * 1024), name: 'big.wav', analysis: okAnalysis },
		status: 413
	},
	{
		what: 'a path-traversal name on a non-audio file',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: {
			upload: text.encode('x'.repeat(2000)),
			name: '../../../etc/passwd',
			analysis: okAnalysis
		}
	},
	{
		what: 'malformed analysis JSON',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: goodWav, name: 'a.wav', analysis: '{"bpm": 120,' }
	},
	{
		what: 'an absurd tempo in the analysis',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: goodWav, name: 'a.wav', analysis: JSON.stringify({ bpm: 40000, meter: 4 }) }
	},
	{
		what: 'a negative tempo in the analysis',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: goodWav, name: 'a.wav', analysis: JSON.stringify({ bpm: -120, meter: 4 }) }
	},
	{
		what: 'a meter of 7 in the analysis',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: goodWav, name: 'a.wav', analysis: JSON.stringify({ bpm: 120, meter: 7 }) }
	},
	{
		what: 'an upload sent as JSON',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { json: { file: 'AAAA' } }
	},
	// API bodies
	{
		what: 'a body that is not JSON',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { raw: 'name=Hop', type: 'text/plain' }
	},
	{
		what: 'truncated JSON',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { raw: '{"name": "Hop", "counts": 3', type: 'application/json' }
	},
	{
		what: 'deeply nested JSON',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { raw: nested(100_000), type: 'application/json' }
	},
	{
		what: 'a huge JSON body (2 MB)',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: {
			raw: JSON.stringify({ ...goodDance, notes: 'n'.repeat(2 * 1024 * 1024) }),
			type: 'application/json'
		},
		status: 413
	},
	{
		what: 'counts of the wrong type',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, counts: 'many' } }
	},
	{
		what: 'negative counts',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, counts: -32 } }
	},
	{
		what: 'absurd counts',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, counts: 1e9 } }
	},
	{
		what: 'three walls',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, walls: 3 } }
	},
	{
		what: 'a tempo range upside down',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, bpmMin: 140, bpmMax: 90 } }
	},
	{
		what: 'a tempo of 5,000 BPM',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, bpmMax: 5000 } }
	},
	{
		what: 'an over-long name',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, name: 'Hop'.repeat(5000) } }
	},
	{
		what: 'control characters in a name',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, name: 'Hop\u0000\u0007' } }
	},
	{
		what: 'a right-to-left override in a name',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, name: 'Hop\u202egnp.exe' } }
	},
	{
		what: 'a SQL-looking number',
		as: 'instructor',
		method: 'POST',
		path: '/api/dances',
		body: { json: { ...goodDance, counts: '32; DROP TABLE dances' } }
	},
	// Issue 13, finding 9: one text rule on every path; a CR/LF in a title forged an e-mail line.
	...(
		[
			['a title with CR/LF in it', 'Reel\r\nBcc: someone@example.test'],
			['a title with a NUL in it', 'Reel\u0000'],
			['a title with a right-to-left override', 'Reel\u202e3pm.exe']
		] as const
	).map(([what, title]): Hostile => ({
		what,
		as: 'dj',
		method: 'PATCH',
		path: '/api/tracks/1',
		body: { json: { version: 1, title } },
		status: 422
	})),
	{
		what: 'an evening venue with a line break in it',
		as: 'organiser',
		method: 'POST',
		path: '/api/evenings',
		body: {
			json: {
				title: 'Invented Night',
				venue: 'Hall\nSubject: forged',
				startsAt: '2027-01-08T19:00:00Z',
				endsAt: '2027-01-08T23:00:00Z'
			}
		},
		status: 422
	},
	{
		what: 'a stale version',
		as: 'dj',
		method: 'PATCH',
		path: '/api/tracks/1',
		body: { json: { version: 999, title: 'Renamed' } },
		status: 409
	},
	{
		what: 'an unknown field',
		as: 'dj',
		method: 'PATCH',
		path: '/api/tracks/1',
		body: { json: { version: 1, owner: 'me' } }
	},
	{
		what: 'a verdict that does not exist',
		as: 'dj',
		method: 'PUT',
		path: '/api/fits',
		body: { json: { trackId: 1, danceId: 1, verdict: 'maybe' } }
	},
	{
		what: 'a fit for a track that does not exist',
		as: 'dj',
		method: 'PUT',
		path: '/api/fits',
		body: { json: { trackId: 999999, danceId: 1, verdict: 'fits' } },
		status: 404
	},
	{
		what: 'an evening that ends before it starts',
		as: 'organiser',
		method: 'POST',
		path: '/api/evenings',
		body: {
			json: {
				title: 'Backwards night',
				startsAt: '2027-03-05T22:00:00Z',
				endsAt: '2027-03-05T19:00:00Z'
			}
		}
	},
	{
		what: 'an impossible date',
		as: 'organiser',
		method: 'POST',
		path: '/api/evenings',
		body: {
			json: {
				title: 'Leap night',
				startsAt: '2027-02-30T25:61:00Z',
				endsAt: '2027-03-01T22:00:00Z'
			}
		}
	},
	{
		what: 'a run order with a version that is not a number',
		as: 'organiser',
		method: 'PUT',
		path: '/api/evenings/1/run-order',
		body: { json: { version: 'latest', entries: [] } }
	},
	{
		what: 'a run-order entry at an absurd rate',
		as: 'organiser',
		method: 'PUT',
		path: '/api/evenings/1/run-order',
		body: {
			json: {
				version: 1,
				entries: [{ kind: 'dance', danceId: 1, trackId: 1, rate: 40, durationS: 180 }]
			}
		}
	},
	// Query strings
	{
		what: 'a tempo filter that is not a number',
		as: 'dj',
		method: 'GET',
		path: '/api/tracks?bpmMin=fast'
	},
	{
		what: 'a SQL-looking tempo filter',
		as: 'dj',
		method: 'GET',
		path: '/api/tracks?bpmMin=1%20OR%201%3D1'
	},
	{ what: 'an absurd page size', as: 'dj', method: 'GET', path: '/api/tracks?limit=100000' },
	{ what: 'a forged cursor', as: 'dj', method: 'GET', path: '/api/tracks?cursor=%27%3B--' },
	{ what: 'an unknown sort', as: 'dj', method: 'GET', path: '/api/tracks?sort=password_hash' },
	{
		what: 'a track id that is not a number',
		as: 'dj',
		method: 'GET',
		path: '/api/tracks/..%2F..%2Fetc'
	},
	// Forms
	{
		what: 'an e-mail of 10,000 characters at sign-in',
		as: 'anon',
		method: 'POST',
		path: '/signin',
		body: { form: { email: `${'a'.repeat(10_000)}@x.test`, password: 'x' } }
	},
	{
		what: 'a password-reset request for something that is not an e-mail address',
		as: 'anon',
		method: 'POST',
		path: '/signin/forgot',
		body: { form: { email: "' OR 1=1 --" } }
	},
	{
		what: 'a new password through a made-up reset link',
		as: 'anon',
		method: 'POST',
		path: '/reset/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA',
		body: { form: { password: 'a long new password', confirm: 'a long new password' } }
	},
	{
		what: 'withdrawing the access of a person id that is negative',
		as: 'admin',
		method: 'POST',
		path: '/admin/people?/withdraw',
		body: { form: { userId: '-1' } }
	},
	{
		what: 'roles for a person who does not exist',
		as: 'admin',
		method: 'POST',
		path: '/admin/people?/roles',
		body: { form: { userId: '424242', roles: 'dj' } },
		status: 404
	},
	{
		what: 'an invitation with a right-to-left override in the name',
		as: 'admin',
		method: 'POST',
		path: '/api/invitations',
		body: { json: { email: 'rtl@floorset.test', name: 'Ada\u202e', roles: ['dancer'] } }
	},
	{
		what: 'an invitation with an unknown role',
		as: 'admin',
		method: 'POST',
		path: '/api/invitations',
		body: { json: { email: 'role@floorset.test', name: 'Ada', roles: ['superuser'] } }
	}
];

let dir: string;
let instance: Instance;
const cookies = new Map<string, string>();

test.describe.configure({ mode: 'serial', timeout: 120_000 });

test.beforeAll(async () => {
	dir = mkdtempSync(join(tmpdir(), 'floorset-hostile-'));
	// A private database and upload folder, seeded the way `npm start` does.
	await seedPrivate(dir);
	instance = await startInstance({
		port: PORT,
		databaseUrl: join(dir, 'floorset.db'),
		uploadDir: join(dir, 'uploads'),
		env: { MAX_UPLOAD_MB: '2' }
	});
	for (const role of ['dj', 'instructor', 'organiser', 'admin']) {
		cookies.set(role, await signInCookie(instance.base, `${role}@floorset.test`));
	}
});
test.afterAll(async () => {
	if (instance) await kill(instance);
	rmSync(dir, { recursive: true, force: true });
});

/** Row counts of every table and the number of stored files. */
function snapshot() {
	const sqlite = new Database(join(dir, 'floorset.db'), { readonly: true });
	const tables = sqlite
		.prepare(
			"select name from sqlite_master where type = 'table' and name not like '\\_%' escape '\\' and name != 'sign_in_failures'"
		)
		.pluck()
		.all() as string[];
	const counts = Object.fromEntries(
		tables.map((t) => [t, sqlite.prepare(`select count(*) from "${t}"`).pluck().get()])
	);
	sqlite.close();
	const files = ['audio', 'sheets'].flatMap((d) => {
		try {
			return readdirSync(join(dir, 'uploads', d));
		} catch {
			return [];
		}
	});
	return { counts, files: files.sort() };
}

async function send(row: Hostile) {
	const headers: Record<string, string> = { origin: instance.base, accept: 'application/json' };
	if (row.as !== 'anon') headers.cookie = cookies.get(row.as)!;
	let body: BodyInit | undefined;
	const b = row.body;
	if (b && 'json' in b) {
		headers['content-type'] = 'application/json';
		body = JSON.stringify(b.json);
	} else if (b && 'raw' in b) {
		headers['content-type'] = b.type;
		body = b.raw;
	} else if (b && 'upload' in b) {
		const form = new FormData();
		form.set(
			'file',
			new Blob([b.upload as BlobPart], { type: b.type ?? 'application/octet-stream' }),
			b.name
		);
		if (b.analysis != null) form.set('analysis', b.analysis);
		body = form;
	} else if (b && 'form' in b) {
		headers['content-type'] = 'application/x-www-form-urlencoded';
		body = new URLSearchParams(b.form).toString();
	}
	// Sent once: a dropped connection is a failure, and a hostile write is never sent twice.
	return fetch(`${instance.base}${row.path}`, { method: row.method, headers, body });
}

for (const row of TABLE) {
	test(`${row.method} ${row.path.split('?')[0]}: ${row.what}`, async () => {
		const before = snapshot();
		const res = await send(row);
		const payload = await res.text();
		// A form action answers a fetch with {type: 'failure', status} (SvelteKit's enhance protocol).
		const failure = /^\{"type":"failure","status":(\d+)/.exec(payload);
		const status = failure ? Number(failure[1]) : res.status;
		const shown = payload.slice(0, 300);
		if (row.status) expect(status, shown).toBe(row.status);
		expect(status, shown).toBeGreaterThanOrEqual(400);
		expect(status, shown).toBeLessThan(500);
		// A message a person understands: a sentence, not a stack trace or a bare code.
		let message = payload;
		try {
			const parsed = JSON.parse(payload);
			message =
				parsed.error ?? parsed.message ?? (typeof parsed.data === 'string' ? parsed.data : '');
		} catch {
			/* a form action's answer may be HTML or devalue text */
		}
		expect(String(message).length, shown).toBeGreaterThan(8);
		expect(String(message), 'no raw validator wording').not.toMatch(/expected (string|number)/);
		expect(payload).not.toMatch(/\bat .+\.(js|ts):\d+/); // no stack trace
		expect(snapshot(), 'nothing written').toEqual(before);
	});
}

test('a SQL-looking search is just text: answered, nothing changed', async () => {
	const before = snapshot();
	const res = await send({
		what: '',
		as: 'dj',
		method: 'GET',
		path: '/api/tracks?q=%27%20OR%201%3D1%20--'
	});
	expect(res.status).toBe(200);
	expect((await res.json()).total).toBe(0);
	expect(snapshot()).toEqual(before);
});

test('the same file twice gives the existing track and no second row', async () => {
	const first = await send({
		what: '',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: goodWav, name: 'twice.wav', analysis: okAnalysis }
	});
	expect(first.status).toBe(201);
	const before = snapshot();
	const again = await send({
		what: '',
		as: 'dj',
		method: 'POST',
		path: '/api/tracks',
		body: { upload: goodWav, name: 'twice-again.wav', analysis: okAnalysis }
	});
	expect(again.status).toBe(200);
	expect((await again.json()).duplicate).toBe(true);
	expect(snapshot()).toEqual(before);
});

test('a damaged session cookie: signed out, cleared in the answer, one short log line', async () => {
	// Issue 13, finding 1: each such request logged a ~2 KB stack trace.
	const logBefore = instance.log().length;
	const answers = await Promise.all(
		Array.from({ length: 50 }, () =>
			fetch(`${instance.base}/api/evenings`, { headers: { cookie: 'authjs.session-token=x' } })
		)
	);
	expect(answers.map((r) => r.status)).toEqual(Array(50).fill(401));
	// The answer clears the cookie (Auth.js sets it empty and already expired).
	const cleared = (
		await fetch(`${instance.base}/signin`, {
			headers: { cookie: 'authjs.session-token=x' }
		}).then((r) => r.headers.getSetCookie())
	).find((c) => c.startsWith('authjs.session-token='));
	expect(cleared).toMatch(/^authjs\.session-token=;/);
	expect(cleared).toMatch(/Max-Age=0|Expires=Thu, 01 Jan 1970/i);
	// The public page, served from its cache, still deletes the cookie nobody could read.
	const sqlite = new Database(join(dir, 'floorset.db'), { readonly: true });
	const token = sqlite
		.prepare('select share_token from evenings where share_token is not null limit 1')
		.pluck()
		.get() as string;
	sqlite.close();
	await fetch(`${instance.base}/e/${token}`).then((r) => r.arrayBuffer());
	const page = await fetch(`${instance.base}/e/${token}`, {
		headers: { cookie: 'authjs.session-token=x' }
	});
	expect(page.status).toBe(200);
	expect(page.headers.getSetCookie()).toContain(
		'authjs.session-token=; Path=/; Max-Age=0; HttpOnly; SameSite=Lax'
	);
	const logged = instance.log().slice(logBefore).split('\n').filter(Boolean);
	expect(logged.length, logged.join('\n')).toBeLessThanOrEqual(1);
	expect(logged.join('').length).toBeLessThan(300);
});
