// The tracks API's handlers called as SvelteKit calls them (a Request and the signed-in person),
// against a real SQLite and a temporary upload folder: multipart parsing, the status codes and
// JSON shapes, Range requests on the audio, and the version check.
import { afterEach, beforeEach, describe, expect, test } from 'vitest';
import { resetConfig } from '$lib/server/config';
import { makeTestDb } from '$lib/server/testing/test-db';
import { analysisJson, png, tempStorage, text, wav } from '$lib/server/testing/tracks';
import { createUser, type SessionUser } from '$lib/server/users';
import * as list from './+server';
import * as one from './[id=id]/+server';
import * as audio from './[id=id]/audio/+server';

const DJ: SessionUser = { id: 1, email: 'dj@floorset.test', name: 'DJ', roles: ['dj'] };
const DANCER: SessionUser = { ...DJ, roles: ['dancer'] };

type Handler = (event: never) => Response | Promise<Response>;
function call(handler: Handler, request: Request, params: Record<string, string> = {}, user = DJ) {
	const event = { request, url: new URL(request.url), params, locals: { user } };
	return handler(event as never);
}
const at = (path: string, init?: RequestInit) => new Request(`http://127.0.0.1${path}`, init);

function uploadRequest(bytes: Uint8Array, name: string, analysis: string | null = analysisJson()) {
	const form = new FormData();
	form.set('file', new File([bytes as BlobPart], name));
	if (analysis !== null) form.set('analysis', analysis);
	return at('/api/tracks', { method: 'POST', body: form });
}

let t: ReturnType<typeof makeTestDb>;
let s: ReturnType<typeof tempStorage>;
beforeEach(() => {
	t = makeTestDb();
	s = tempStorage();
	createUser({ email: DJ.email, name: DJ.name, passwordHash: null, roles: ['dj'] });
});
afterEach(() => {
	s.cleanup();
	t.cleanup();
	delete process.env.MAX_UPLOAD_MB;
	resetConfig();
});

async function stored() {
	const res = await call(list.POST, uploadRequest(wav(120, 3).bytes, 'Reel.wav'));
	expect(res.status).toBe(201);
	return ((await res.json()) as { track: { id: number; fileSize: number; version: number } }).track;
}

describe('POST /api/tracks', () => {
	test('201 with the track, then 200 with duplicate: true for the same bytes', async () => {
		const track = await stored();
		const again = await call(list.POST, uploadRequest(wav(120, 3).bytes, 'copy.wav'));
		expect(again.status).toBe(200);
		expect(await again.json()).toMatchObject({ duplicate: true, track: { id: track.id } });
	});

	test('bad uploads answer 4xx JSON errors and leave nothing', async () => {
		const cases: [Request, number][] = [
			[uploadRequest(text(), 'lyrics.mp3'), 415],
			[uploadRequest(png(), 'cover.mp3'), 415],
			[uploadRequest(new Uint8Array(0), 'empty.mp3'), 422],
			[uploadRequest(wav().bytes.slice(0, 300), 'cut.wav'), 422],
			[uploadRequest(wav().bytes, 'a.wav', null), 400],
			[uploadRequest(wav().bytes, 'a.wav', '{not json'), 400],
			[
				at('/api/tracks', {
					method: 'POST',
					body: JSON.stringify({}),
					headers: { 'content-type': 'application/json' }
				}),
				415
			],
			[at('/api/tracks', { method: 'POST', body: new FormData() }), 400]
		];
		for (const [request, status] of cases) {
			const res = await call(list.POST, request);
			expect(res.status).toBe(status);
			expect(typeof ((await res.json()) as { error: string }).error).toBe('string');
		}
		expect(s.files()).toEqual([]);
	});

	test('413 over the size limit, checked before the body is read', async () => {
		process.env.MAX_UPLOAD_MB = '0.01';
		resetConfig();
		const res = await call(list.POST, uploadRequest(wav(120, 4).bytes, 'big.wav'));
		expect(res.status).toBe(413);
		expect(s.files()).toEqual([]);
	});

	test('refused by its declared length, the body is still read through (the connection stays in step)', async () => {
		process.env.MAX_UPLOAD_MB = '0.01';
		resetConfig();
		let sent = 0;
		const chunk = new Uint8Array(64 * 1024);
		const body = new ReadableStream<Uint8Array>({
			pull(c) {
				if (sent >= 8) return c.close();
				sent++;
				c.enqueue(chunk);
			}
		});
		const request = at('/api/tracks', {
			method: 'POST',
			body,
			duplex: 'half',
			headers: {
				'content-type': 'multipart/form-data; boundary=x',
				'content-length': String(8 * chunk.length)
			}
		} as RequestInit);
		const res = await call(list.POST, request);
		expect(res.status).toBe(413);
		expect(sent).toBe(8);
		expect(s.files()).toEqual([]);
	});

	test('a dancer may not upload', async () => {
		await expect(
			call(list.POST, uploadRequest(wav().bytes, 'a.wav'), {}, DANCER)
		).rejects.toMatchObject({
			status: 403
		});
	});
});

describe('GET /api/tracks', () => {
	test('items, nextCursor and total; a bad query is a 400', async () => {
		await stored();
		const res = await call(list.GET, at('/api/tracks?limit=1&sort=-bpm'));
		expect(await res.json()).toMatchObject({ total: 1, nextCursor: null, items: [{ bpm: 120 }] });
		expect((await call(list.GET, at('/api/tracks?limit=9999'))).status).toBe(400);
		expect((await call(list.GET, at('/api/tracks?cursor=nonsense'))).status).toBe(400);
	});

	test('a kept page never outlives a change: edits, deletes and direct writes show at once', async () => {
		const track = await stored();
		const page = async () =>
			(await (await call(list.GET, at('/api/tracks?limit=5'))).json()) as {
				total: number;
				items: { title: string; bpm: number }[];
			};
		expect((await page()).items[0].bpm).toBe(120);
		expect((await page()).items[0].bpm).toBe(120);
		await call(
			one.PATCH,
			at(`/api/tracks/${track.id}`, {
				method: 'PATCH',
				body: JSON.stringify({ version: 1, bpm: 96 }),
				headers: { 'content-type': 'application/json' }
			}),
			{ id: String(track.id) }
		);
		expect((await page()).items[0].bpm).toBe(96);
		// A write from outside the routes (a script, another module) counts as much.
		t.db.$client.prepare("UPDATE tracks SET title = 'Renamed by hand'").run();
		expect((await page()).items[0].title).toBe('Renamed by hand');
		await call(one.DELETE, at(`/api/tracks/${track.id}`, { method: 'DELETE' }), {
			id: String(track.id)
		});
		expect((await page()).total).toBe(0);
	});
});

describe('PATCH and DELETE /api/tracks/:id', () => {
	test('PATCH with the current version saves; a stale one is 409 with the current track', async () => {
		const track = await stored();
		const patch = (body: unknown) =>
			call(
				one.PATCH,
				at(`/api/tracks/${track.id}`, {
					method: 'PATCH',
					body: JSON.stringify(body),
					headers: { 'content-type': 'application/json' }
				}),
				{ id: String(track.id) }
			);
		const ok = await patch({ version: 1, bpm: 60, bpmSource: 'tapped' });
		expect(await ok.json()).toMatchObject({ track: { bpm: 60, bpmSource: 'tapped', version: 2 } });
		const stale = await patch({ version: 1, bpm: 61 });
		expect(stale.status).toBe(409);
		expect(await stale.json()).toMatchObject({
			error: expect.any(String),
			current: { bpm: 60, version: 2 }
		});
		expect((await patch({ bpm: 61 })).status).toBe(422);
		expect((await patch({ version: 2, storageKey: 'audio/x' })).status).toBe(422);
	});

	test('DELETE removes the row and the file; a second DELETE is 404', async () => {
		const track = await stored();
		const del = () =>
			call(one.DELETE, at(`/api/tracks/${track.id}`, { method: 'DELETE' }), {
				id: String(track.id)
			});
		expect((await del()).status).toBe(204);
		expect(s.files()).toEqual([]);
		expect((await del()).status).toBe(404);
		expect((await call(one.GET, at('/api/tracks/abc'), { id: 'abc' })).status).toBe(404);
	});
});

describe('GET /api/tracks/:id/audio', () => {
	const get = (id: number, headers: Record<string, string> = {}) =>
		call(audio.GET, at(`/api/tracks/${id}/audio`, { headers }), { id: String(id) });

	test('the whole file, with its type, our file name and nosniff', async () => {
		const track = await stored();
		const res = await get(track.id);
		expect(res.status).toBe(200);
		expect(res.headers.get('content-type')).toBe('audio/wav');
		expect(res.headers.get('accept-ranges')).toBe('bytes');
		expect(res.headers.get('content-disposition')).toBe(`inline; filename="track-${track.id}.wav"`);
		expect(res.headers.get('x-content-type-options')).toBe('nosniff');
		const bytes = new Uint8Array(await res.arrayBuffer());
		expect(bytes.length).toBe(track.fileSize);
		expect(new TextDecoder().decode(bytes.slice(0, 4))).toBe('RIFF');
	});

	test('206 for a range (RFC 9110 §14), 416 past the end', async () => {
		const track = await stored();
		const part = await get(track.id, { range: 'bytes=8-11' });
		expect(part.status).toBe(206);
		expect(part.headers.get('content-range')).toBe(`bytes 8-11/${track.fileSize}`);
		expect(new TextDecoder().decode(await part.arrayBuffer())).toBe('WAVE');
		const tail = await get(track.id, { range: 'bytes=-10' });
		expect(tail.headers.get('content-range')).toBe(
			`bytes ${track.fileSize - 10}-${track.fileSize - 1}/${track.fileSize}`
		);
		expect((await tail.arrayBuffer()).byteLength).toBe(10);
		const bad = await get(track.id, { range: `bytes=${track.fileSize}-` });
		expect(bad.status).toBe(416);
		expect(bad.headers.get('content-range')).toBe(`bytes */${track.fileSize}`);
	});

	test('404 for a track that does not exist', async () => {
		expect((await get(999)).status).toBe(404);
	});
});
