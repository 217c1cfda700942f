// The helper against a stand-in for the browser's fetch: what a screen sees for a good answer,
// a refusal with the server's sentence, an answer with no JSON, and no answer at all.
import { afterEach, expect, test, vi } from 'vitest';
import { api, ApiError, UNREACHABLE } from './api-client';

afterEach(() => vi.unstubAllGlobals());

const answer = (status: number, body: string) =>
	vi.fn(
		async () => new Response(body, { status, headers: { 'content-type': 'application/json' } })
	);

test('a 2xx answer is its JSON; a body is sent as JSON with its content type', async () => {
	const fetch = answer(200, '{"sent":3}');
	vi.stubGlobal('fetch', fetch);
	expect(await api<{ sent: number }>('/api/x', { method: 'POST', body: { a: 1 } })).toEqual({
		sent: 3
	});
	const [url, init] = fetch.mock.calls[0] as unknown as [string, RequestInit];
	expect(url).toBe('/api/x');
	expect(init.body).toBe('{"a":1}');
	expect(init.headers).toMatchObject({ 'content-type': 'application/json' });
});

test("a refusal throws the server's sentence, its status and the whole answer", async () => {
	vi.stubGlobal('fetch', answer(409, '{"error":"Someone saved first.","current":{"id":4}}'));
	const e = (await api('/api/x').catch((x: unknown) => x)) as ApiError;
	expect(e).toBeInstanceOf(ApiError);
	expect(e.message).toBe('Someone saved first.');
	expect(e.status).toBe(409);
	expect(e.body.current).toEqual({ id: 4 });
});

test('an answer without JSON still says its status; no answer says the server is out of reach', async () => {
	vi.stubGlobal('fetch', answer(502, '<html>bad gateway</html>'));
	await expect(api('/api/x')).rejects.toThrow('The server answered 502.');
	vi.stubGlobal(
		'fetch',
		vi.fn(async () => Promise.reject(new TypeError('Failed to fetch')))
	);
	const e = (await api('/api/x').catch((x: unknown) => x)) as ApiError;
	expect([e.message, e.status]).toEqual([UNREACHABLE, 0]);
});
