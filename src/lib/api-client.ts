// The browser's one way to call Floorset's JSON API: JSON in and out, and one error shape — the
// server's own `{ error }` sentence with the status, or a sentence of ours when the server
// cannot be reached — so every screen says what went wrong the same way.

export class ApiError extends Error {
	constructor(
		message: string,
		/** The HTTP status; 0 when no answer came. */
		readonly status: number,
		/** The whole answer, for routes that send more than the sentence (a 409's saved version). */
		readonly body: Record<string, unknown> = {}
	) {
		super(message);
	}
}

export const UNREACHABLE = 'Could not reach Floorset. Check the connection and try again.';

/** Calls `url`; `body`, when given, is sent as JSON. Throws ApiError when the answer is not 2xx. */
export async function api<T>(
	url: string,
	init: { method?: string; body?: unknown; signal?: AbortSignal } = {}
): Promise<T> {
	const headers: Record<string, string> = { accept: 'application/json' };
	if (init.body !== undefined) headers['content-type'] = 'application/json';
	let res: Response;
	try {
		res = await fetch(url, {
			method: init.method,
			headers,
			body: init.body === undefined ? undefined : JSON.stringify(init.body),
			signal: init.signal
		});
	} catch (e) {
		if (init.signal?.aborted) throw e;
		throw new ApiError(UNREACHABLE, 0);
	}
	const body = (await res.json().catch(() => ({}))) as Record<string, unknown>;
	if (!res.ok) {
		const said = typeof body.error === 'string' ? body.error : `The server answered ${res.status}.`;
		throw new ApiError(said, res.status, body);
	}
	return body as T;
}
